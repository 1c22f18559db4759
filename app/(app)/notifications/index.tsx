import { NotificationsScreen } from '@/components/notifications/notifications-screen';
import { useSessionQuery } from '@/components/queries/session';

export default function NotificationsPage() {
  const { data: user } = useSessionQuery();
  return user ? <NotificationsScreen user={user} /> : null;
}
