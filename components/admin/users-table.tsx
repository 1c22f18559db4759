import { useMemo } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { useUserUpdateMutation } from '@/components/queries/users';
import { Badge } from '@/components/ui/badge';
import { DataTable, type DataTableColumn } from '@/components/ui/data-table';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { CARDS_BELOW, colors, fonts, space } from '@/components/ui/theme';
import type { UserRow } from '@/shared/api-types';
import { ROLE_LABELS, ROLES } from '@/shared/roles';

export function UsersTable({ users, currentUserId }: { users: UserRow[]; currentUserId: number }) {
  const update = useUserUpdateMutation();

  const columns = useMemo<DataTableColumn<UserRow>[]>(
    () => [
      { accessorKey: 'name', header: 'Name', meta: { width: 190 } },
      { accessorKey: 'email', header: 'E-mail', meta: { width: 230 } },
      {
        accessorKey: 'role',
        header: 'Role',
        meta: { width: 300 },
        cell: ({ row }) => (
          <View role="radiogroup" aria-label={`Role of ${row.original.name}`} style={styles.roles}>
            {ROLES.map((role) => {
              const selected = row.original.role === role;
              return (
                <Pressable
                  key={role}
                  role="radio"
                  aria-checked={selected}
                  accessibilityLabel={`${ROLE_LABELS[role]} for ${row.original.name}`}
                  disabled={selected || row.original.id === currentUserId}
                  onPress={() => update.mutate({ id: row.original.id, role })}
                  style={[styles.role, selected && styles.roleSelected]}
                >
                  <Text style={[styles.roleText, selected && styles.roleTextSelected]}>{ROLE_LABELS[role]}</Text>
                </Pressable>
              );
            })}
          </View>
        ),
      },
      {
        id: 'status',
        accessorFn: (row) => (row.active ? 'Active' : 'Deactivated'),
        header: 'Status',
        meta: { width: 130 },
        cell: ({ row }) => <Badge label={row.original.active ? 'Active' : 'Deactivated'} tone={row.original.active ? 'pass' : 'fail'} />,
      },
      {
        id: 'actions',
        header: 'Action',
        enableSorting: false,
        meta: { width: 150 },
        cell: ({ row }) =>
          row.original.id === currentUserId ? (
            <Text variant="muted">You</Text>
          ) : (
            <Pressable
              role="button"
              accessibilityLabel={`${row.original.active ? 'Deactivate' : 'Reactivate'} ${row.original.name}`}
              onPress={() => update.mutate({ id: row.original.id, active: !row.original.active })}
              style={styles.action}
            >
              <Text style={styles.actionText}>{row.original.active ? 'Deactivate' : 'Reactivate'}</Text>
            </Pressable>
          ),
      },
    ],
    [currentUserId, update],
  );

  return (
    <View style={{ gap: space.sm }}>
      {update.error ? <Notice tone="error">{update.error.message}</Notice> : null}
      <DataTable
        label="Users"
        columns={columns}
        data={users}
        emptyText="No users yet."
        getRowId={(u) => String(u.id)}
        initialSorting={[{ id: 'name', desc: false }]}
        cardsBelow={CARDS_BELOW}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  roles: { flexDirection: 'row', gap: 4, flexWrap: 'wrap' },
  role: { borderWidth: 1, borderColor: colors.line, borderRadius: 4, paddingHorizontal: 8, paddingVertical: 4 },
  roleSelected: { backgroundColor: colors.ink, borderColor: colors.ink },
  roleText: { fontFamily: fonts.regular, fontSize: 13, color: colors.ink },
  roleTextSelected: { color: colors.surface, fontFamily: fonts.semibold },
  action: {
    borderWidth: 1,
    borderColor: colors.ink,
    borderRadius: 6,
    paddingHorizontal: space.md,
    paddingVertical: 6,
    alignSelf: 'flex-start',
  },
  actionText: { fontFamily: fonts.semibold, fontSize: 14, color: colors.ink },
});
