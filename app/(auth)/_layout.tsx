import { Redirect, Slot } from 'expo-router';
import { homeFor } from '@/shared/navigation';
import { useSessionQuery } from '@/components/queries/session';

export default function AuthLayout() {
  const { data: user, isPending } = useSessionQuery();
  if (isPending) return null;
  if (user) return <Redirect href={homeFor(user.role) as never} />;
  return <Slot />;
}
