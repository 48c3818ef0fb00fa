import { Redirect, usePathname } from 'expo-router';
import { useEffect, type ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View, type PressableStateCallbackType } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { ROLE_LABELS } from '@/modules/accounts/core/roles';
import { LAYOUT, PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';
import { LinkPressable } from '@/modules/theme/ui/link-pressable';
import { useWide } from '@/modules/theme/ui/use-wide';

import { BrandMark } from './brand-mark';
import { rememberReturnPath, type SessionUser } from './session';
import { NAV_ITEMS, currentNavHref, redirectFor, type NavItem } from './staff-nav';
import { useMeSync } from './use-me';
import { useSession } from './use-session';

type WebPressState = PressableStateCallbackType & { hovered?: boolean };

/** The signed-in part of the app: sends strangers to sign-in and each role away from pages not its own. */
export function StaffArea({ children }: { children: ReactNode }) {
  const { user, signedOutByUser } = useSession();
  const pathname = usePathname();
  if (!user) return <ToSignIn returnTo={signedOutByUser || pathname === '/' ? null : pathname} />;
  const elsewhere = redirectFor(user.role, pathname);
  if (elsewhere) return <Redirect href={elsewhere} />;
  return (
    <StaffShell user={user} pathname={pathname}>
      {children}
    </StaffShell>
  );
}

/** Off to sign in, remembering the page (a deep link, or where an expired session left off). */
function ToSignIn({ returnTo }: { returnTo: string | null }) {
  useEffect(() => {
    if (returnTo) rememberReturnPath(returnTo);
  }, [returnTo]);
  return <Redirect href="/sign-in" />;
}

function StaffShell({ user, pathname, children }: { user: SessionUser; pathname: string; children: ReactNode }) {
  useMeSync();
  const wide = useWide();
  const items = NAV_ITEMS[user.role];
  const current = currentNavHref(user.role, pathname);
  if (wide) {
    return (
      <View style={styles.wideRoot}>
        <SideNav items={items} current={current} user={user} />
        <View role="main" style={styles.main}>
          {children}
        </View>
      </View>
    );
  }
  return (
    <View style={styles.phoneRoot}>
      <TopBar user={user} />
      <View role="main" style={styles.main}>
        {children}
      </View>
      <BottomBar items={items} current={current} />
    </View>
  );
}

function Wordmark() {
  return (
    <View style={styles.wordmark}>
      <BrandMark />
      <Text style={[TYPE_SCALE.heading, styles.wordmarkText]}>Feltwire</Text>
    </View>
  );
}

function SignOutButton({ compact }: { compact?: boolean }) {
  const { signOut } = useSession();
  return (
    <Pressable
      role="button"
      onPress={signOut}
      testID="sign-out"
      style={(state) => [styles.signOut, compact && styles.signOutCompact, (state as WebPressState).hovered && styles.signOutHover]}
    >
      <Text style={[TYPE_SCALE.label, styles.onFelt]}>Sign out</Text>
    </Pressable>
  );
}

function SideNav({ items, current, user }: { items: readonly NavItem[]; current: string | null; user: SessionUser }) {
  return (
    <View role="navigation" aria-label="Main" style={styles.side}>
      <Wordmark />
      <View style={styles.sideList}>
        {items.map((item) => {
          const active = item.href === current;
          return (
            <LinkPressable
              key={item.href}
              href={item.href}
              current={active}
              testID={`nav-${item.href.slice(1)}`}
              style={({ hovered }) => [styles.sideItem, hovered && !active && styles.sideItemHover, active && styles.sideItemActive]}
            >
              <Text style={[TYPE_SCALE.bodyStrong, active ? styles.activeText : styles.onFeltStrong]}>{item.label}</Text>
              <Text style={[TYPE_SCALE.small, active ? styles.activeHint : styles.onFelt]}>{item.hint}</Text>
            </LinkPressable>
          );
        })}
      </View>
      <View style={styles.sideFoot}>
        <View style={styles.who}>
          <Text style={[TYPE_SCALE.bodyStrong, styles.onFeltStrong]} testID="signed-in-name">
            {user.name}
          </Text>
          <Text style={[TYPE_SCALE.small, styles.onFelt]} testID="signed-in-role">
            {ROLE_LABELS[user.role]}
          </Text>
        </View>
        <SignOutButton />
      </View>
    </View>
  );
}

function TopBar({ user }: { user: SessionUser }) {
  const insets = useSafeAreaInsets();
  return (
    <View role="banner" style={[styles.top, { paddingTop: insets.top + SPACE.sm }]}>
      <Wordmark />
      <View style={styles.topRight}>
        <View style={styles.whoCompact}>
          <Text numberOfLines={1} style={[TYPE_SCALE.label, styles.onFeltStrong]} testID="signed-in-name">
            {user.name}
          </Text>
          <Text numberOfLines={1} style={[TYPE_SCALE.small, styles.onFelt]} testID="signed-in-role">
            {ROLE_LABELS[user.role]}
          </Text>
        </View>
        <SignOutButton compact />
      </View>
    </View>
  );
}

function BottomBar({ items, current }: { items: readonly NavItem[]; current: string | null }) {
  const insets = useSafeAreaInsets();
  return (
    <View role="navigation" aria-label="Main" style={[styles.bottom, { paddingBottom: insets.bottom }]}>
      {items.map((item) => {
        const active = item.href === current;
        return (
          <LinkPressable key={item.href} href={item.href} current={active} testID={`nav-${item.href.slice(1)}`} style={() => [styles.tab, active && styles.tabActive]}>
            <View aria-hidden style={[styles.tabMark, active && styles.tabMarkActive]} />
            <Text style={[TYPE_SCALE.label, active ? styles.activeText : styles.tabText]}>{item.label}</Text>
          </LinkPressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: PALETTE.ivory },
  phoneRoot: { flex: 1, backgroundColor: PALETTE.ivory },
  main: { flex: 1, minWidth: 0 },
  onFelt: { color: PALETTE.feltLichen },
  onFeltStrong: { color: PALETTE.ivory },
  activeText: { color: PALETTE.felt },
  activeHint: { color: PALETTE.pinGrey },
  wordmark: { flexDirection: 'row', alignItems: 'center', gap: SPACE.sm },
  wordmarkText: { color: PALETTE.ivory },

  side: { width: LAYOUT.sideNavWidth, backgroundColor: PALETTE.felt, paddingHorizontal: SPACE.lg, paddingVertical: SPACE.xl, gap: SPACE.xl },
  sideList: { gap: SPACE.xs, flex: 1 },
  sideItem: { minHeight: LAYOUT.touchTarget + 8, paddingHorizontal: SPACE.md, paddingVertical: SPACE.sm, borderRadius: RADIUS.md, justifyContent: 'center' },
  sideItemHover: { backgroundColor: PALETTE.feltShade },
  sideItemActive: { backgroundColor: PALETTE.ivory },
  sideFoot: { gap: SPACE.md, borderTopWidth: 1, borderTopColor: 'rgba(201,216,207,0.35)', paddingTop: SPACE.lg },
  who: { gap: SPACE.xxs },
  signOut: {
    minHeight: LAYOUT.touchTarget,
    paddingHorizontal: SPACE.lg,
    borderRadius: RADIUS.md,
    borderWidth: 1.5,
    borderColor: PALETTE.feltLichen,
    alignItems: 'center',
    justifyContent: 'center',
    alignSelf: 'flex-start',
  },
  signOutCompact: { paddingHorizontal: SPACE.md },
  signOutHover: { backgroundColor: PALETTE.feltShade },

  top: {
    backgroundColor: PALETTE.felt,
    paddingHorizontal: SPACE.lg,
    paddingBottom: SPACE.sm,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: SPACE.md,
  },
  topRight: { flexDirection: 'row', alignItems: 'center', gap: SPACE.md, flexShrink: 1 },
  whoCompact: { alignItems: 'flex-end', flexShrink: 1 },

  bottom: { flexDirection: 'row', backgroundColor: PALETTE.vellum, borderTopWidth: 1, borderTopColor: PALETTE.linen },
  tab: { flex: 1, minHeight: LAYOUT.touchTarget + 12, alignItems: 'center', justifyContent: 'center', gap: SPACE.xs, paddingBottom: SPACE.xs },
  tabActive: { backgroundColor: PALETTE.feltMist },
  tabMark: { width: 28, height: 4, borderRadius: RADIUS.pill, backgroundColor: 'transparent' },
  tabMarkActive: { backgroundColor: PALETTE.felt },
  tabText: { color: PALETTE.walnut },
});
