import { type ReactNode, useState } from 'react';
import { Link, usePathname } from 'expo-router';
import { Pressable, StyleSheet, useWindowDimensions, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { colors, layout, radii, spacing, touchTarget, typography } from '../../constants/theme';
import { ROLE_LABELS, type PublicUser } from '../../shared/schemas/auth';
import { Text } from '../ui/text';
import { isActive, navItemsFor, splitForTabBar, type NavItem } from './nav-items';
import { pressState } from '../ui/press-state';

export interface AppShellProps {
  user: PublicUser;
  onSignOut: () => void;
  signingOut: boolean;
  children: ReactNode;
}

/** Phone first: a bottom tab bar with a top bar; from `layout.wideBreakpoint` up, a side rail. */
export function AppShell({ user, onSignOut, signingOut, children }: AppShellProps) {
  const { width } = useWindowDimensions();
  const pathname = usePathname();
  const items = navItemsFor(user.role);
  const wide = width >= layout.wideBreakpoint;

  if (wide) {
    return (
      <View style={styles.wideRoot}>
        <View style={styles.rail}>
          <Wordmark />
          <View role="navigation" aria-label="Main" style={styles.railItems}>
            {items.map((item) => (
              <NavLink key={item.segment} item={item} active={isActive(item, pathname)} orientation="rail" />
            ))}
          </View>
          <View style={styles.railFooter}>
            <Text variant="bodyStrong" style={styles.navText}>
              {user.name}
            </Text>
            <Text variant="caption" style={styles.navText}>
              {ROLE_LABELS[user.role]}
            </Text>
            <SignOutButton onSignOut={onSignOut} signingOut={signingOut} />
          </View>
        </View>
        <View role="main" style={styles.main}>
          {children}
        </View>
      </View>
    );
  }

  return (
    <View style={styles.narrowRoot}>
      <TopBar onSignOut={onSignOut} signingOut={signingOut} />
      <View role="main" style={styles.main}>
        {children}
      </View>
      <BottomTabs items={items} pathname={pathname} />
    </View>
  );
}

function Wordmark() {
  return (
    <View style={styles.wordmark}>
      <View style={styles.mark} />
      <Text variant="heading" style={styles.wordmarkText}>
        Dilato
      </Text>
    </View>
  );
}

function TopBar({ onSignOut, signingOut }: { onSignOut: () => void; signingOut: boolean }) {
  const insets = useSafeAreaInsets();
  return (
    <View style={[styles.topBar, { paddingTop: insets.top + spacing.xs }]}>
      <Wordmark />
      <SignOutButton onSignOut={onSignOut} signingOut={signingOut} />
    </View>
  );
}

/** A phone has room for four tabs: the rest sit behind "More", in a panel above the bar. */
function BottomTabs({ items, pathname }: { items: NavItem[]; pathname: string }) {
  const insets = useSafeAreaInsets();
  // The panel belongs to the screen it was opened on, so moving to another screen closes it.
  const [openOn, setOpenOn] = useState<string | null>(null);
  const open = openOn === pathname;
  const { tabs, more } = splitForTabBar(items);
  const moreActive = more.some((item) => isActive(item, pathname));
  return (
    <View role="navigation" aria-label="Main">
      {open && more.length > 0 ? (
        <View style={styles.morePanel} aria-label="More screens">
          {more.map((item) => (
            <NavLink key={item.segment} item={item} active={isActive(item, pathname)} orientation="rail" />
          ))}
        </View>
      ) : null}
      <View style={[styles.tabBar, { paddingBottom: insets.bottom }]}>
        {tabs.map((item) => (
          <NavLink key={item.segment} item={item} active={isActive(item, pathname)} orientation="tab" />
        ))}
        {more.length > 0 ? (
          <Pressable
            accessibilityRole="button"
            accessibilityLabel="More"
            aria-expanded={open}
            onPress={() => setOpenOn(open ? null : pathname)}
            style={StyleSheet.flatten([styles.tabItem, (open || moreActive) && styles.itemActive])}
          >
            <View style={[styles.tabMarker, moreActive && styles.markerActive]} />
            <Text style={[styles.itemLabel, moreActive && styles.itemLabelActive]}>More</Text>
          </Pressable>
        ) : null}
      </View>
    </View>
  );
}

function NavLink({ item, active, orientation }: { item: NavItem; active: boolean; orientation: 'rail' | 'tab' }) {
  // Link's asChild passes the child's style straight to the DOM: no callback, no array.
  const [hovered, setHovered] = useState(false);
  const [focused, setFocused] = useState(false);
  return (
    <Link href={item.href} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={item.label}
        aria-current={active ? 'page' : undefined}
        onHoverIn={() => setHovered(true)}
        onHoverOut={() => setHovered(false)}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        style={StyleSheet.flatten([
          orientation === 'rail' ? styles.railItem : styles.tabItem,
          (active || hovered) && styles.itemActive,
          focused && styles.itemFocused,
        ])}
      >
        <View style={[orientation === 'rail' ? styles.railMarker : styles.tabMarker, active && styles.markerActive]} />
        <Text style={[styles.itemLabel, active && styles.itemLabelActive]}>{item.label}</Text>
      </Pressable>
    </Link>
  );
}

function SignOutButton({ onSignOut, signingOut }: { onSignOut: () => void; signingOut: boolean }) {
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel="Sign out"
      disabled={signingOut}
      onPress={onSignOut}
      style={(state) => {
        const { focused, hovered } = pressState(state);
        return [
        styles.signOut,
        hovered && styles.itemActive,
        focused && styles.itemFocused,
      ];
      }}
    >
      <Text style={styles.itemLabel}>{signingOut ? 'Signing out…' : 'Sign out'}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.background },
  narrowRoot: { flex: 1, backgroundColor: colors.background },
  main: { flex: 1 },
  rail: {
    width: layout.railWidth,
    backgroundColor: colors.nav,
    borderRightWidth: 1,
    borderRightColor: colors.navBorder,
    paddingVertical: spacing.xl,
    paddingHorizontal: spacing.md,
    gap: spacing.xl,
  },
  railItems: { gap: spacing.xs, flex: 1 },
  railFooter: { gap: spacing.xs, borderTopWidth: 1, borderTopColor: colors.navBorder, paddingTop: spacing.lg },
  navText: { color: colors.navText, paddingHorizontal: spacing.sm },
  wordmark: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, paddingHorizontal: spacing.sm },
  mark: {
    width: 14,
    height: 28,
    borderRadius: radii.sm,
    backgroundColor: colors.navMarker,
    borderRightWidth: 5,
    borderRightColor: colors.warning,
  },
  wordmarkText: { color: colors.onPrimary, letterSpacing: 0.5 },
  topBar: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    backgroundColor: colors.nav,
    paddingHorizontal: spacing.md,
    paddingBottom: spacing.xs,
  },
  morePanel: {
    backgroundColor: colors.nav,
    borderTopWidth: 1,
    borderTopColor: colors.navBorder,
    padding: spacing.sm,
    gap: spacing.xs,
  },
  tabBar: {
    flexDirection: 'row',
    backgroundColor: colors.nav,
    borderTopWidth: 1,
    borderTopColor: colors.navBorder,
  },
  railItem: {
    minHeight: touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    paddingRight: spacing.md,
    borderRadius: radii.md,
  },
  tabItem: {
    flex: 1,
    minHeight: touchTarget + spacing.md,
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.xs,
  },
  railMarker: { width: 4, alignSelf: 'stretch', borderRadius: radii.sm, backgroundColor: 'transparent' },
  tabMarker: {
    position: 'absolute',
    top: 0,
    left: spacing.xl,
    right: spacing.xl,
    height: 4,
    borderBottomLeftRadius: radii.sm,
    borderBottomRightRadius: radii.sm,
    backgroundColor: 'transparent',
  },
  markerActive: { backgroundColor: colors.navMarker },
  itemActive: { backgroundColor: colors.navActiveBackground },
  itemFocused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: -3 },
  itemLabel: { ...typography.label, fontSize: 17, color: colors.navText },
  itemLabelActive: { color: colors.navTextActive },
  signOut: {
    minHeight: touchTarget,
    minWidth: touchTarget,
    paddingHorizontal: spacing.md,
    justifyContent: 'center',
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.navBorder,
  },
});
