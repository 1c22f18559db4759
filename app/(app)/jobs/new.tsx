import { NewJobForm } from '@/components/jobs/new-job-form';
import { RequireRole } from '@/components/shell/require-role';

export default function NewJobPage() {
  return (
    <RequireRole roles={['manager', 'admin']}>
      <NewJobForm />
    </RequireRole>
  );
}
