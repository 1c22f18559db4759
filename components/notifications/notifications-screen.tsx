// Everything Sightline told this person, newest first, each linked to its job; and their
// choice of which kinds also come by e-mail.
import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { formatDateTime } from '@/components/lib/format';
import {
  useMarkAllReadMutation,
  useMarkReadMutation,
  useNotificationPrefsQuery,
  useNotificationsQuery,
  useSetNotificationPrefMutation,
} from '@/components/queries/notifications';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Section } from '@/components/ui/section';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';
import type { SessionUser } from '@/shared/api-types';
import { notificationHref, type NotificationView } from '@/shared/notifications';

export function NotificationsScreen({ user }: { user: SessionUser }) {
  const list = useNotificationsQuery();
  const markAll = useMarkAllReadMutation();
  const unread = list.data?.unread ?? 0;
  return (
    <Screen
      title="Notifications"
      subtitle={list.data ? `${unread} unread` : undefined}
      actions={
        unread > 0 ? <Button label="Mark all read" tone="secondary" onPress={() => markAll.mutate()} busy={markAll.isPending} /> : null
      }
    >
      {list.error ? <Notice tone="error">{list.error.message}</Notice> : null}
      {list.data && list.data.items.length === 0 ? <Text variant="muted">Nothing yet. New work and decisions show up here.</Text> : null}
      <View role="list" aria-label="Notifications" style={{ gap: space.sm }}>
        {(list.data?.items ?? []).map((item) => (
          <NotificationRow key={item.id} item={item} href={notificationHref(user.role, item.jobId)} />
        ))}
      </View>
      <EmailChoices />
    </Screen>
  );
}

function NotificationRow({ item, href }: { item: NotificationView; href: string | null }) {
  const markRead = useMarkReadMutation();
  return (
    <View role="listitem" style={[styles.row, !item.read && styles.unread]}>
      <View style={{ flexShrink: 1, gap: 2 }}>
        <Text style={!item.read ? { fontFamily: fonts.semibold } : undefined}>{item.text}</Text>
        <Text variant="muted">{`${item.read ? 'Read' : 'Unread'} · ${formatDateTime(item.createdAt)}`}</Text>
      </View>
      <View style={styles.actions}>
        {href ? (
          <Link href={href as never} onPress={() => (item.read ? undefined : markRead.mutate(item.id))} style={styles.link}>
            Open the job
          </Link>
        ) : null}
        {!item.read ? (
          <Button label="Mark read" tone="secondary" onPress={() => markRead.mutate(item.id)} accessibilityHint={item.text} />
        ) : null}
      </View>
    </View>
  );
}

function EmailChoices() {
  const prefs = useNotificationPrefsQuery();
  const setPref = useSetNotificationPrefMutation();
  if (!prefs.data || prefs.data.length === 0) return null;
  return (
    <Section title="E-mail me as well" summary="Every notice shows here; ticked kinds also come by e-mail">
      {prefs.data.map((p) => (
        <Checkbox key={p.kind} label={p.label} checked={p.email} onChange={(email) => setPref.mutate({ kind: p.kind, email })} />
      ))}
      {setPref.error ? <Notice tone="error">{`Not saved: ${setPref.error.message}`}</Notice> : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    justifyContent: 'space-between',
    alignItems: 'center',
    gap: space.sm,
    padding: space.md,
    borderRadius: 6,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
  },
  unread: { borderLeftWidth: 4, borderLeftColor: colors.accent },
  actions: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  link: { color: colors.accent, fontFamily: fonts.semibold },
});
