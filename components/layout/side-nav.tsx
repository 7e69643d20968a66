import { StyleSheet, View } from 'react-native';
import { usePathname } from 'expo-router';
import { sideNavWidth, spacing } from '@/constants/theme';
import type { NavItem } from '@/hooks/use-nav-items';
import { useTheme } from '@/hooks/use-theme';
import type { Me } from '@/shared/schemas/role';
import { Brand } from '@/components/ui/brand';
import { AppText } from '@/components/ui/text';
import { NavLink } from './nav-link';
import { SignOutButton } from './sign-out-button';

const roleLabel: Record<Me['role'], string> = {
  clinician: 'Clinician',
  musician: 'Musician',
  teacher: 'Teacher',
  admin: 'Administrator',
};

export interface SideNavProps {
  me: Me;
  items: NavItem[];
}

/** Wide screens: the navigation stands in a column on the left, with the account at its foot. */
export function SideNav({ me, items }: SideNavProps) {
  const { colors } = useTheme();
  const pathname = usePathname();
  return (
    <View
      role="navigation"
      aria-label="Main"
      style={[styles.nav, { backgroundColor: colors.surface, borderRightColor: colors.border }]}
    >
      <View style={styles.brand}>
        <Brand size={32} />
      </View>
      <View style={styles.items}>
        {items.map((item) => (
          <NavLink key={item.href} item={item} active={pathname.startsWith(item.href)} />
        ))}
      </View>
      <View style={[styles.account, { borderTopColor: colors.border }]}>
        <AppText variant="bodyStrong" numberOfLines={1}>
          {me.name}
        </AppText>
        <AppText variant="caption" tone="muted" numberOfLines={1}>
          {`${roleLabel[me.role]} · ${me.email}`}
        </AppText>
        <SignOutButton />
        <SignOutButton everywhere />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  nav: { width: sideNavWidth, borderRightWidth: 1, padding: spacing.lg, gap: spacing.xl },
  brand: { paddingHorizontal: spacing.xs, paddingTop: spacing.sm },
  items: { gap: spacing.xs, flex: 1 },
  account: { borderTopWidth: 1, paddingTop: spacing.md, gap: spacing.xxs },
});
