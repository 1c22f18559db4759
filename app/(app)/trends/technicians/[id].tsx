import { useLocalSearchParams } from 'expo-router';

import { RequireRole } from '@/components/shell/require-role';
import { TechnicianTrendsPage } from '@/components/trends/technician-page';

export default function TechnicianTrendsRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return (
    <RequireRole roles={['manager']}>
      <TechnicianTrendsPage technicianId={Number(id)} />
    </RequireRole>
  );
}
