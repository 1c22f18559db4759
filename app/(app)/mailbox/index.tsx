import { MailboxScreen } from '@/components/mailbox/mailbox-screen';

// Access is decided by the server: admins always, everyone in development.
export default function MailboxPage() {
  return <MailboxScreen />;
}
