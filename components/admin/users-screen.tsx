import { useWindowDimensions, View } from 'react-native';

import { useSessionQuery } from '@/components/queries/session';
import { useUsersQuery } from '@/components/queries/users';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { space, WIDE_BREAKPOINT } from '@/components/ui/theme';

import { CreateUserForm } from './create-user-form';
import { UsersTable } from './users-table';

export function UsersScreen() {
  const { data: me } = useSessionQuery();
  const users = useUsersQuery();
  const wide = useWindowDimensions().width >= WIDE_BREAKPOINT;

  return (
    <Screen title="Users" subtitle="Accounts, roles and access. Deactivated people are signed out at once.">
      {users.error ? <Notice tone="error">{users.error.message}</Notice> : null}
      <View style={{ flexDirection: wide ? 'row' : 'column', gap: space.lg, alignItems: 'flex-start' }}>
        <View style={{ flex: wide ? 3 : undefined, width: wide ? undefined : '100%' }}>
          {users.isPending ? <Text variant="muted">Loading users…</Text> : null}
          {users.data && me ? <UsersTable users={users.data} currentUserId={me.id} /> : null}
        </View>
        <View style={{ flex: wide ? 1 : undefined, minWidth: wide ? 320 : undefined, width: wide ? undefined : '100%' }}>
          <CreateUserForm />
        </View>
      </View>
    </Screen>
  );
}
