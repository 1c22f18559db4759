import { Redirect, Slot } from 'expo-router';

import { useSessionQuery } from '@/components/queries/session';
import { AppShell } from '@/components/shell/app-shell';
import { Notice } from '@/components/ui/notice';

// Guard for every signed-in page: no session, no page.
export default function SignedInLayout() {
  const { data: user, isPending, error } = useSessionQuery();
  if (isPending) return null;
  if (error) return <Notice tone="error">{error.message}</Notice>;
  if (!user) return <Redirect href="/sign-in" />;
  return (
    <AppShell user={user}>
      <Slot />
    </AppShell>
  );
}
