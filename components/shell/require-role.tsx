import { useSessionQuery } from '@/components/queries/session';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import type { Role } from '@/shared/roles';

// Hides a page from roles that cannot use it. The server refuses them anyway.
export function RequireRole({ roles, children }: { roles: Role[]; children: React.ReactNode }) {
  const { data: user } = useSessionQuery();
  if (!user) return null;
  if (!roles.includes(user.role)) {
    return (
      <Screen title="Not available">
        <Notice tone="info">This page is not part of your role. Use the menu to go to your own pages.</Notice>
      </Screen>
    );
  }
  return <>{children}</>;
}
