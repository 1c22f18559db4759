// Phone: compact header and a bottom tab bar. Wide screens (≥ 1024 px): a sidebar.
import { Link, usePathname } from 'expo-router';
import { Pressable, StyleSheet, useWindowDimensions, View } from 'react-native';

import { useSignOutMutation } from '@/components/queries/session';
import { Text } from '@/components/ui/text';
import { colors, fonts, space, WIDE_BREAKPOINT } from '@/components/ui/theme';
import type { SessionUser } from '@/shared/api-types';
import { navFor } from '@/shared/navigation';
import { ROLE_LABELS } from '@/shared/roles';

import { FailedEmailNotice } from './failed-email-notice';
import { NotificationBell } from './notification-bell';

export function AppShell({ user, children }: { user: SessionUser; children: React.ReactNode }) {
  const { width } = useWindowDimensions();
  const wide = width >= WIDE_BREAKPOINT;
  const pathname = usePathname();
  const signOut = useSignOutMutation();
  const items = navFor(user.role, { mailboxOpen: user.mailboxOpen });
  const staff = user.role === 'manager' || user.role === 'admin';
  const isCurrent = (href: string) => pathname === href || pathname.startsWith(`${href}/`);

  const navLinks = items.map((item) => {
    const current = isCurrent(item.href);
    return (
      <View
        key={item.href + item.label}
        style={[wide ? styles.sideLink : styles.tab, current && (wide ? styles.sideLinkActive : styles.tabActive)]}
      >
        <Link
          href={item.href as never}
          aria-current={current ? 'page' : undefined}
          style={StyleSheet.flatten([
            styles.navText,
            wide ? styles.sideText : styles.tabText,
            current && (wide ? styles.sideTextActive : styles.tabTextActive),
          ])}
        >
          {item.label}
        </Link>
      </View>
    );
  });

  const signOutButton = (
    <Pressable role="button" accessibilityLabel="Sign out" onPress={() => signOut.mutate()} style={styles.signOut}>
      <Text style={styles.signOutText}>Sign out</Text>
    </Pressable>
  );

  const identity = (
    <View>
      <Text style={styles.userName}>{user.name}</Text>
      <Text style={styles.userRole}>{ROLE_LABELS[user.role]}</Text>
      <Link href="/account/password" style={styles.userRole}>
        Change password
      </Link>
    </View>
  );

  if (wide) {
    return (
      <View style={styles.wideRoot}>
        <View role="navigation" aria-label="Main" style={styles.sidebar}>
          <View style={styles.brandRow}>
            <Text style={styles.brand}>Sightline</Text>
            <NotificationBell current={isCurrent('/notifications')} />
          </View>
          <View style={{ gap: space.xs }}>{navLinks}</View>
          <View style={{ flexGrow: 1 }} />
          {identity}
          {signOutButton}
        </View>
        <View role="main" style={styles.main}>
          {staff ? <FailedEmailNotice /> : null}
          {children}
        </View>
      </View>
    );
  }

  return (
    <View style={styles.phoneRoot}>
      <View style={styles.header} role="banner">
        <Text style={styles.brand}>Sightline</Text>
        <View style={styles.headerRight}>
          <NotificationBell current={isCurrent('/notifications')} />
          {identity}
          {signOutButton}
        </View>
      </View>
      <View role="main" style={styles.main}>
        {staff ? <FailedEmailNotice /> : null}
        {children}
      </View>
      <View role="navigation" aria-label="Main" style={styles.tabBar}>
        {navLinks}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.paper },
  sidebar: { width: 232, backgroundColor: colors.ink, padding: space.lg, gap: space.lg },
  phoneRoot: { flex: 1, backgroundColor: colors.paper },
  header: {
    flexDirection: 'row',
    justifyContent: 'space-between',
    alignItems: 'center',
    paddingHorizontal: space.lg,
    paddingVertical: space.sm,
    backgroundColor: colors.ink,
  },
  brandRow: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center' },
  headerRight: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  main: { flex: 1 },
  brand: { fontFamily: fonts.bold, fontSize: 20, color: colors.paper, letterSpacing: 0.5 },
  sideLink: { paddingHorizontal: space.md, borderRadius: 6, borderLeftWidth: 4, borderLeftColor: 'transparent' },
  sideLinkActive: { backgroundColor: colors.sidebarActive, borderLeftColor: colors.accent },
  tabBar: { flexDirection: 'row', borderTopWidth: 1, borderTopColor: colors.line, backgroundColor: colors.surface },
  tab: { flex: 1, minHeight: 56, justifyContent: 'center', borderTopWidth: 3, borderTopColor: 'transparent' },
  tabActive: { borderTopColor: colors.accent },
  navText: { fontFamily: fonts.semibold, fontSize: 15, paddingVertical: space.sm },
  tabText: { textAlign: 'center', alignSelf: 'stretch', paddingVertical: space.md, color: colors.muted },
  tabTextActive: { color: colors.accent },
  sideText: { color: colors.sidebarText },
  sideTextActive: { color: colors.paper },
  userName: { fontFamily: fonts.semibold, fontSize: 14, color: colors.paper },
  userRole: { fontFamily: fonts.regular, fontSize: 13, color: colors.sidebarText },
  signOut: {
    borderWidth: 1,
    borderColor: colors.paper,
    borderRadius: 6,
    paddingHorizontal: space.md,
    minHeight: 36,
    justifyContent: 'center',
  },
  signOutText: { fontFamily: fonts.semibold, fontSize: 14, color: colors.paper },
});
