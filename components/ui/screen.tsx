import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { maxContentWidth, spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from './text';

export interface ScreenProps {
  testID: string;
  title: string;
  /** One sentence that tells the person what to do next. */
  lead?: string;
  actions?: ReactNode;
  children: ReactNode;
  footer?: ReactNode;
}

/** A scrolling page with a title, a guiding sentence and a centred column capped at the content width. */
export function Screen({ testID, title, lead, actions, children, footer }: ScreenProps) {
  const { colors } = useTheme();
  const { isMedium } = useBreakpoints();
  return (
    <ScrollView
      testID={testID}
      style={{ backgroundColor: colors.background }}
      contentContainerStyle={[styles.scroll, isMedium && styles.scrollWide]}
    >
      <View style={styles.column}>
        <View style={[styles.header, isMedium && styles.headerWide]}>
          <View style={styles.headerText}>
            <AppText variant="title">{title}</AppText>
            {lead ? (
              <AppText tone="muted" style={styles.lead}>
                {lead}
              </AppText>
            ) : null}
          </View>
          {actions}
        </View>
        {children}
        {footer}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1, padding: spacing.lg, paddingBottom: spacing.xxxl },
  scrollWide: { padding: spacing.xxl },
  column: { width: '100%', maxWidth: maxContentWidth, alignSelf: 'center', gap: spacing.xl },
  header: { gap: spacing.md },
  headerWide: { flexDirection: 'row', alignItems: 'flex-end', justifyContent: 'space-between' },
  headerText: { gap: spacing.xs, flexShrink: 1 },
  lead: { maxWidth: 640 },
});
