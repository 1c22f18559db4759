import { RequireRole } from '@/components/shell/require-role';
import { KitSettingsScreen } from '@/components/visit-plan/kit-settings-screen';

export default function KitPage() {
  return (
    <RequireRole roles={['manager']}>
      <KitSettingsScreen />
    </RequireRole>
  );
}
