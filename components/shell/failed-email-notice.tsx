// Managers and admins are told, on every page, about e-mail that could not be sent after every
// attempt, and can send it again once the cause is fixed.
import { View } from 'react-native';

import { useFailedEmailRetryMutation, useFailedEmailsQuery } from '@/components/queries/outbox';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { space } from '@/components/ui/theme';

export function FailedEmailNotice() {
  const failed = useFailedEmailsQuery(true);
  const retry = useFailedEmailRetryMutation();
  const messages = failed.data ?? [];
  if (messages.length === 0) return null;
  return (
    <View style={{ gap: space.sm, marginBottom: space.md }}>
      <Notice tone="error">{`${messages.length} e-mail(s) could not be sent after every attempt. Check the address or the mail service, then send again.`}</Notice>
      {messages.slice(0, 5).map((m) => (
        <View key={m.id} style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'center' }}>
          <Text variant="small">{`${m.subject} — ${m.attempts} attempts; last error: ${m.lastError ?? 'unknown'}`}</Text>
          <Button label={`Send "${m.subject}" again`} tone="secondary" onPress={() => retry.mutate(m.id)} busy={retry.isPending} />
        </View>
      ))}
    </View>
  );
}
