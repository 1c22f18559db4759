import { useLocalSearchParams } from 'expo-router';

import { SharedSummaryScreen } from '@/components/share/shared-summary-screen';

export default function SharedSummaryPage() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <SharedSummaryScreen token={String(token ?? '')} />;
}
