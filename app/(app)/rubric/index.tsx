import { RubricEditor } from '@/components/review/rubric-editor';
import { RequireRole } from '@/components/shell/require-role';

export default function RubricPage() {
  return (
    <RequireRole roles={['manager']}>
      <RubricEditor />
    </RequireRole>
  );
}
