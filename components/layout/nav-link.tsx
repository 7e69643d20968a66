import { Pressable, StyleSheet } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { Link } from 'expo-router';
import { radii, spacing, touchTarget } from '@/constants/theme';
import type { NavItem } from '@/hooks/use-nav-items';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from '@/components/ui/text';

export interface NavLinkProps {
  item: NavItem;
  active: boolean;
  compact?: boolean;
}

/** One navigation entry; the current page is marked by a fill, a bar and aria-current, not colour alone. */
export function NavLink({ item, active, compact = false }: NavLinkProps) {
  const { colors } = useTheme();
  return (
    <Link href={item.href} asChild>
      <Pressable
        testID={item.testID}
        accessibilityRole="link"
        accessibilityLabel={item.label}
        aria-current={active ? 'page' : undefined}
        // One flat style object: on the web Link's asChild hands the style straight to the anchor element.
        style={StyleSheet.flatten([
          styles.link,
          compact && styles.compact,
          { borderColor: active ? colors.primary : 'transparent' },
          active && { backgroundColor: colors.surfaceMuted },
        ])}
      >
        <Icon name={item.icon} size={20} color={active ? colors.primary : colors.textMuted} />
        <AppText variant={compact ? 'label' : active ? 'bodyStrong' : 'body'} tone={active ? 'primary' : 'default'} numberOfLines={1}>
          {item.label}
        </AppText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    minHeight: touchTarget,
    paddingHorizontal: spacing.md,
    borderRadius: radii.md,
    borderLeftWidth: 3,
  },
  // Phones: equal tabs, icon over label, so four sections fit in 390 px without scrolling sideways.
  compact: { flex: 1, flexDirection: 'column', justifyContent: 'center', borderLeftWidth: 0, borderBottomWidth: 3, borderRadius: 0, paddingHorizontal: spacing.xs, paddingVertical: spacing.xs, gap: 0 },
});
