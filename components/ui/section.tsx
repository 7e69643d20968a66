import type { ReactNode } from 'react';
import { StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';
import { spacing } from '@/constants/theme';
import { AppText } from './text';

export interface SectionProps {
  title: string;
  description?: string;
  children: ReactNode;
  style?: StyleProp<ViewStyle>;
  testID?: string;
}

/** A titled part of a screen. */
export function Section({ title, description, children, style, testID }: SectionProps) {
  return (
    <View style={[styles.section, style]} testID={testID}>
      <View style={styles.head}>
        <AppText variant="heading">{title}</AppText>
        {description ? (
          <AppText variant="caption" tone="muted">
            {description}
          </AppText>
        ) : null}
      </View>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: spacing.md },
  head: { gap: spacing.xxs },
});
