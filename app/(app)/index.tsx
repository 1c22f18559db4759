import { Redirect } from 'expo-router';
import { homeFor } from '@/shared/navigation';
import { useSessionQuery } from '@/components/queries/session';

export default function Home() {
  const { data: user } = useSessionQuery();
  return user ? <Redirect href={homeFor(user.role) as never} /> : null;
}
