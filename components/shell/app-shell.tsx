import { usePathname } from 'expo-router';
import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { navItemsFor, type NavItem } from '@/components/shell/nav-items';
import { Wordmark } from '@/components/shell/wordmark';
import { LinkPressable, type PressState } from '@/components/ui/link-pressable';
import { Text } from '@/components/ui/text';
import { useWide } from '@/components/ui/use-wide';
import { borders, colors, layout, space } from '@/components/theme';
import type { User } from '@/shared/auth';

export interface AppShellProps {
  user: User;
  children: ReactNode;
}

const roleWords: Record<User['role'], string> = { archer: 'Archer', tech: 'Technician', admin: 'Administrator' };

function RailLink({ item, active }: { item: NavItem; active: boolean }) {
  const Icon = item.icon;
  return (
    <LinkPressable
      href={item.href}
      aria-current={active ? 'page' : undefined}
      style={({ pressed, hovered, focused }: PressState) => [
        styles.railLink,
        (active || pressed || hovered) && styles.railLinkActive,
        focused && styles.focused,
      ]}
    >
      <View style={[styles.railIndicator, active && styles.railIndicatorActive]} />
      <Icon size={24} color={active ? colors.onSlate : colors.onSlateMuted} />
      <Text variant="label" tone={active ? 'onSlate' : 'onSlateMuted'}>
        {item.label}
      </Text>
    </LinkPressable>
  );
}

function TabLink({ item, active }: { item: NavItem; active: boolean }) {
  const Icon = item.icon;
  return (
    <LinkPressable
      href={item.href}
      aria-current={active ? 'page' : undefined}
      style={({ pressed, focused }: PressState) => [styles.tab, pressed && styles.tabPressed, focused && styles.focused]}
    >
      <View style={[styles.tabIndicator, active && styles.tabIndicatorActive]} />
      <Icon size={26} color={active ? colors.signal : colors.inkSoft} />
      <Text variant={active ? 'label' : 'small'} tone={active ? 'signal' : 'soft'} style={styles.tabLabel}>
        {item.label}
      </Text>
    </LinkPressable>
  );
}

/**
 * The signed-in frame: a left rail on wide screens; a top bar with the
 * wordmark and a bottom tab bar on phones. The current screen goes in `children`.
 * Example: `<AppShell user={me.data}><Stack /></AppShell>`
 */
export function AppShell({ user, children }: AppShellProps) {
  const wide = useWide();
  const pathname = usePathname();
  const insets = useSafeAreaInsets();
  const items = navItemsFor(user.role);

  if (wide) {
    return (
      <View style={styles.wideRoot}>
        <View style={styles.rail} role="navigation" aria-label="Main">
          <LinkPressable href="/" accessibilityLabel="Pinwright, go to Bench" style={() => styles.railBrand}>
            <Wordmark size={30} />
          </LinkPressable>
          <View style={styles.railLinks}>
            {items.map((item) => (
              <RailLink key={item.label} item={item} active={item.matches(pathname)} />
            ))}
          </View>
          <View style={styles.railUser}>
            <Text variant="label" tone="onSlate" numberOfLines={1}>
              {user.name}
            </Text>
            <Text variant="caption" tone="onSlateMuted">
              {roleWords[user.role]}
            </Text>
          </View>
        </View>
        <View style={styles.main} role="main">
          {children}
        </View>
      </View>
    );
  }

  return (
    <View style={styles.phoneRoot}>
      <View style={[styles.topBar, { paddingTop: insets.top }]} role="banner">
        <Wordmark size={26} />
      </View>
      <View style={styles.main} role="main">
        {children}
      </View>
      <View
        style={[styles.bottomBar, { paddingBottom: insets.bottom, height: layout.bottomBarHeight + insets.bottom }]}
        role="navigation"
        aria-label="Main"
      >
        {items.map((item) => (
          <TabLink key={item.label} item={item} active={item.matches(pathname)} />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.paper },
  rail: {
    width: layout.railWidth,
    backgroundColor: colors.slate,
    paddingTop: space.xl,
    paddingBottom: space.lg,
  },
  railBrand: { paddingHorizontal: space.xl, paddingBottom: space.xl, minHeight: layout.minTap, justifyContent: 'center' },
  railLinks: { gap: space.xs, flex: 1 },
  railLink: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    minHeight: layout.minTap + 4,
    paddingRight: space.lg,
  },
  railLinkActive: { backgroundColor: colors.slateRaised },
  railIndicator: { width: borders.heavy, alignSelf: 'stretch', marginRight: space.lg, backgroundColor: 'transparent' },
  railIndicatorActive: { backgroundColor: colors.signalOnSlate },
  railUser: {
    marginHorizontal: space.xl,
    paddingTop: space.lg,
    borderTopWidth: borders.hairline,
    borderTopColor: colors.slateRaised,
  },
  main: { flex: 1, minWidth: 0 },
  phoneRoot: { flex: 1, backgroundColor: colors.paper },
  topBar: {
    backgroundColor: colors.slate,
    minHeight: 56,
    paddingHorizontal: space.lg,
    justifyContent: 'center',
  },
  bottomBar: {
    flexDirection: 'row',
    backgroundColor: colors.surface,
    borderTopWidth: borders.hairline,
    borderTopColor: colors.line,
  },
  tab: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.xxs, minHeight: layout.minTap },
  tabPressed: { backgroundColor: colors.sunken },
  tabIndicator: { position: 'absolute', top: 0, left: '25%', right: '25%', height: 3, borderRadius: 2 },
  tabIndicatorActive: { backgroundColor: colors.signal },
  tabLabel: { fontSize: 14, lineHeight: 18 },
  focused: { outlineColor: colors.focus, outlineStyle: 'solid', outlineWidth: borders.focus, outlineOffset: -2 },
});
