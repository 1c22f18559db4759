import { useLocalSearchParams } from 'expo-router';

import { JobScreen } from '@/components/jobs/job-screen';
import { RequireRole } from '@/components/shell/require-role';

export default function JobPage() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return (
    <RequireRole roles={['technician', 'reviewer', 'manager', 'admin']}>
      <JobScreen id={Number(id)} />
    </RequireRole>
  );
}
