import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { radii, spacing, type ColorTokens } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from './text';

export type BannerTone = 'info' | 'success' | 'warning' | 'danger';

const look: Record<BannerTone, { fg: keyof ColorTokens; bg: keyof ColorTokens; icon: 'information-circle' | 'checkmark-circle' | 'warning' | 'alert-circle' }> = {
  info: { fg: 'info', bg: 'infoSurface', icon: 'information-circle' },
  success: { fg: 'success', bg: 'successSurface', icon: 'checkmark-circle' },
  warning: { fg: 'warning', bg: 'warningSurface', icon: 'warning' },
  danger: { fg: 'danger', bg: 'dangerSurface', icon: 'alert-circle' },
};

export interface BannerProps {
  tone: BannerTone;
  title?: string;
  children: ReactNode;
  testID?: string;
}

/** A short message with an icon and words, so its meaning never rests on colour alone. */
export function Banner({ tone, title, children, testID }: BannerProps) {
  const { colors } = useTheme();
  const { fg, bg, icon } = look[tone];
  return (
    <View
      testID={testID}
      // "note", not RN's "summary": on the web that becomes an unnamed region, which checkers flag.
      role={tone === 'danger' ? 'alert' : 'note'}
      style={[styles.box, { backgroundColor: colors[bg], borderColor: colors[fg] }]}
    >
      <Icon name={icon} size={20} color={colors[fg]} style={styles.icon} />
      <View style={styles.body}>
        {title ? <AppText variant="bodyStrong">{title}</AppText> : null}
        {typeof children === 'string' ? <AppText variant="caption">{children}</AppText> : children}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { flexDirection: 'row', gap: spacing.sm, padding: spacing.md, borderRadius: radii.md, borderLeftWidth: 4 },
  icon: { marginTop: 2 },
  body: { flex: 1, gap: spacing.xxs },
});
