import { Redirect } from 'expo-router';

import { useSessionQuery } from '@/components/queries/session';
import { homeFor } from '@/shared/navigation';

export default function Home() {
  const { data: user } = useSessionQuery();
  return user ? <Redirect href={homeFor(user.role) as never} /> : null;
}
