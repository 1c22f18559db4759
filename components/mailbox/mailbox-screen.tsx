import { useState } from 'react';
import { Pressable, StyleSheet, useWindowDimensions, View } from 'react-native';

import { formatDateTime } from '@/components/lib/format';
import { useMailboxQuery } from '@/components/queries/mailbox';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { colors, fonts, space, WIDE_BREAKPOINT } from '@/components/ui/theme';

import { MessageBody } from './message-body';

// What the local fake SMTP server received: how people check Sightline's e-mail without a
// real mail service.
export function MailboxScreen() {
  const mailbox = useMailboxQuery();
  const [openId, setOpenId] = useState<string | null>(null);
  const wide = useWindowDimensions().width >= WIDE_BREAKPOINT;
  const messages = mailbox.data ?? [];
  const open = messages.find((m) => m.id === openId) ?? messages[0];

  return (
    <Screen title="Mailbox" subtitle="E-mail caught by the local SMTP server (development and tests). Newest first.">
      {mailbox.error ? <Notice tone="error">{mailbox.error.message}</Notice> : null}
      {mailbox.data && messages.length === 0 ? <Text variant="muted">No messages yet.</Text> : null}
      <View style={[{ gap: space.md }, wide && { flexDirection: 'row', alignItems: 'flex-start' }]}>
        <View style={[styles.list, wide && { width: 420 }]} role="list" aria-label="Messages">
          {messages.map((m) => (
            <Pressable
              key={m.id}
              role="listitem"
              accessibilityLabel={`Open message ${m.subject}`}
              aria-current={open?.id === m.id}
              onPress={() => setOpenId(m.id)}
              style={[styles.row, open?.id === m.id && styles.rowOpen]}
            >
              <Text style={{ fontFamily: fonts.semibold }}>{m.subject}</Text>
              <Text variant="muted">{`To ${m.to.join(', ')} · ${formatDateTime(m.receivedAt)}`}</Text>
            </Pressable>
          ))}
        </View>
        {open ? (
          <View style={[styles.viewer, wide && { flex: 1 }]}>
            <Text variant="heading" role="heading" aria-level={2}>
              {open.subject}
            </Text>
            <Text variant="muted">{`From ${open.from} to ${open.to.join(', ')} · ${formatDateTime(open.receivedAt)}`}</Text>
            <MessageBody html={open.html} text={open.text} title={open.subject} />
            <Text variant="label">Plain-text part</Text>
            <Text variant="small" style={{ fontFamily: fonts.regular }}>
              {open.text}
            </Text>
          </View>
        ) : null}
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xs },
  row: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 6, padding: space.md, gap: 2 },
  rowOpen: { borderColor: colors.accent, borderLeftWidth: 4 },
  viewer: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.lg, gap: space.sm },
});
