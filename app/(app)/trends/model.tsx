import { RiskModelScreen } from '@/components/risk/risk-model-screen';
import { RequireRole } from '@/components/shell/require-role';

export default function RiskModelPage() {
  return (
    <RequireRole roles={['manager']}>
      <RiskModelScreen />
    </RequireRole>
  );
}
