// The way to the notifications, with the unread count in words (a bell shape alone says
// nothing to a screen reader, and a red dot alone says nothing without colour).
import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import Svg, { Path } from 'react-native-svg';

import { useNotificationsQuery } from '@/components/queries/notifications';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/ui/theme';

export function NotificationBell({ current }: { current: boolean }) {
  const unread = useNotificationsQuery().data?.unread ?? 0;
  const label = unread > 0 ? `Notifications, ${unread} unread` : 'Notifications, none unread';
  return (
    <Link href="/notifications" aria-label={label} aria-current={current ? 'page' : undefined} style={styles.link}>
      <View style={styles.row}>
        <Svg width={18} height={18} viewBox="0 0 18 18" aria-hidden>
          <Path
            d="M9 2.2a4.6 4.6 0 0 0-4.6 4.6v3.1L3 12.6h12l-1.4-2.7V6.8A4.6 4.6 0 0 0 9 2.2ZM7.2 14.4a1.9 1.9 0 0 0 3.6 0"
            stroke={colors.paper}
            strokeWidth={1.6}
            fill="none"
            strokeLinejoin="round"
          />
        </Svg>
        {unread > 0 ? (
          <View style={styles.count}>
            <Text style={styles.countText}>{unread > 99 ? '99+' : String(unread)}</Text>
          </View>
        ) : null}
      </View>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { padding: space.xs, borderRadius: 6 },
  row: { flexDirection: 'row', alignItems: 'center', gap: 4 },
  count: { minWidth: 20, paddingHorizontal: 5, borderRadius: 10, backgroundColor: colors.accent, alignItems: 'center' },
  countText: { color: colors.surface, fontFamily: fonts.semibold, fontSize: 12 },
});
