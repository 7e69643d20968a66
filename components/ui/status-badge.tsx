import type { ComponentProps } from 'react';
import { StyleSheet, View } from 'react-native';
import { Icon, type IconName } from '@/components/ui/icon';
import { radii, spacing, type ColorTokens } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from './text';

export type BadgeTone = 'neutral' | 'success' | 'warning' | 'danger';

const look: Record<BadgeTone, { fg: keyof ColorTokens; bg: keyof ColorTokens }> = {
  neutral: { fg: 'info', bg: 'infoSurface' },
  success: { fg: 'success', bg: 'successSurface' },
  warning: { fg: 'warning', bg: 'warningSurface' },
  danger: { fg: 'danger', bg: 'dangerSurface' },
};

export interface StatusBadgeProps {
  label: string;
  tone: BadgeTone;
  icon: IconName;
  testID?: string;
}

/** A state shown as icon plus words on a tinted chip. */
export function StatusBadge({ label, tone, icon, testID }: StatusBadgeProps) {
  const { colors } = useTheme();
  const { fg, bg } = look[tone];
  return (
    <View testID={testID} style={[styles.badge, { backgroundColor: colors[bg] }]}>
      <Icon name={icon} size={14} color={colors[fg]} />
      <AppText variant="label" style={{ color: colors[fg] }}>
        {label}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: spacing.xs,
    paddingHorizontal: spacing.sm,
    paddingVertical: spacing.xxs,
    borderRadius: radii.pill,
  },
});
