import type { ComponentProps } from 'react';
import { StyleSheet, View } from 'react-native';
import { Icon, type IconName } from '@/components/ui/icon';
import { radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from './text';

export interface EmptyStateProps {
  icon: IconName;
  title: string;
  children: string;
  testID?: string;
}

/** What an empty list means and what to do about it. */
export function EmptyState({ icon, title, children, testID }: EmptyStateProps) {
  const { colors } = useTheme();
  return (
    <View testID={testID} style={[styles.box, { borderColor: colors.border }]}>
      <Icon name={icon} size={28} color={colors.accent} />
      <AppText variant="heading">{title}</AppText>
      <AppText tone="muted" style={styles.text}>
        {children}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { alignItems: 'center', gap: spacing.sm, padding: spacing.xl, borderWidth: 1, borderStyle: 'dashed', borderRadius: radii.lg },
  text: { textAlign: 'center', maxWidth: 420 },
});
