import { RequireRole } from '@/components/shell/require-role';
import { TechnicianTrendsPage } from '@/components/trends/technician-page';

export default function MyTrendsRoute() {
  return (
    <RequireRole roles={['technician']}>
      <TechnicianTrendsPage technicianId={null} />
    </RequireRole>
  );
}
