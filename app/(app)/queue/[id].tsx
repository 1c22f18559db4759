import { useLocalSearchParams } from 'expo-router';

import { ReviewScreen } from '@/components/review/review-screen';
import { RequireRole } from '@/components/shell/require-role';

export default function ReviewPage() {
  const { id, second } = useLocalSearchParams<{ id: string; second?: string }>();
  return (
    <RequireRole roles={['reviewer', 'manager']}>
      <ReviewScreen jobId={Number(id)} second={second ? Number(second) : null} />
    </RequireRole>
  );
}
