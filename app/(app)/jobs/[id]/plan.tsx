import { useLocalSearchParams } from 'expo-router';

import { RequireRole } from '@/components/shell/require-role';
import { PlanScreen } from '@/components/visit-plan/plan-screen';

export default function VisitPlanPage() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return (
    <RequireRole roles={['technician', 'reviewer', 'manager', 'admin']}>
      <PlanScreen id={Number(id)} />
    </RequireRole>
  );
}
