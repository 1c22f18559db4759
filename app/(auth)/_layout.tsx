import { Redirect, Slot } from 'expo-router';

import { useSessionQuery } from '@/components/queries/session';
import { homeFor } from '@/shared/navigation';

export default function AuthLayout() {
  const { data: user, isPending } = useSessionQuery();
  if (isPending) return null;
  if (user) return <Redirect href={homeFor(user.role) as never} />;
  return <Slot />;
}
