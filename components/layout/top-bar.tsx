import { StyleSheet, View } from 'react-native';
import { usePathname } from 'expo-router';
import { spacing } from '@/constants/theme';
import type { NavItem } from '@/hooks/use-nav-items';
import { useTheme } from '@/hooks/use-theme';
import { Brand } from '@/components/ui/brand';
import { NavLink } from './nav-link';
import { SignOutButton } from './sign-out-button';

export interface TopBarProps {
  items: NavItem[];
}

/** Phones: the brand and sign-out on top; a row of sections underneath when a role has more than one. */
export function TopBar({ items }: TopBarProps) {
  const { colors } = useTheme();
  const pathname = usePathname();
  return (
    <View role="navigation" aria-label="Main" style={[styles.bar, { backgroundColor: colors.surface, borderBottomColor: colors.border }]}>
      <View style={styles.row}>
        <Brand size={28} />
        <SignOutButton />
      </View>
      {items.length > 1 ? (
        <View style={styles.tabs}>
          {items.map((item) => (
            <NavLink key={item.href} item={item} active={pathname.startsWith(item.href)} compact />
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { borderBottomWidth: 1, paddingHorizontal: spacing.lg, paddingTop: spacing.sm },
  row: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', paddingBottom: spacing.sm },
  tabs: { flexDirection: 'row', gap: spacing.xs },
});
