import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { maxFormWidth, radii, spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useTheme } from '@/hooks/use-theme';
import { Brand } from '@/components/ui/brand';
import { AppText } from '@/components/ui/text';

export interface AuthFrameProps {
  testID: string;
  title: string;
  lead: string;
  children: ReactNode;
}

const points = [
  { icon: 'trending-up-outline', text: 'Playing time and difficulty rise stage by stage toward your concert.' },
  { icon: 'hand-left-outline', text: 'Pain means stop: every session has checks before, between and after playing.' },
  { icon: 'people-outline', text: 'Teachers see what is cleared to play, never medical detail.' },
] as const;

/** The frame of every signed-out screen: the brand, a title, and the form; a welcome panel on wide screens. */
export function AuthFrame({ testID, title, lead, children }: AuthFrameProps) {
  const { colors } = useTheme();
  const { isWide } = useBreakpoints();
  return (
    <ScrollView testID={testID} style={{ backgroundColor: colors.background }} contentContainerStyle={styles.scroll}>
      <View style={[styles.shell, isWide && styles.shellWide]}>
        {isWide ? (
          <View style={[styles.panel, { backgroundColor: colors.surfaceMuted, borderColor: colors.border }]}>
            <Brand size={40} />
            <AppText variant="display">Back to playing, one stage at a time.</AppText>
            {points.map((point) => (
              <View key={point.icon} style={styles.point}>
                <Icon name={point.icon} size={22} color={colors.accent} />
                <AppText style={styles.pointText}>{point.text}</AppText>
              </View>
            ))}
          </View>
        ) : (
          <View style={styles.phoneBrand}>
            <Brand size={36} />
          </View>
        )}
        <View style={[styles.card, { backgroundColor: colors.surface, borderColor: colors.border }, isWide && styles.cardWide]}>
          <View style={styles.heading}>
            <AppText variant="title">{title}</AppText>
            <AppText tone="muted">{lead}</AppText>
          </View>
          {children}
        </View>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1, justifyContent: 'center', padding: spacing.lg },
  shell: { width: '100%', maxWidth: maxFormWidth, alignSelf: 'center', gap: spacing.xl },
  shellWide: { maxWidth: 980, flexDirection: 'row', alignItems: 'stretch', gap: spacing.xxl },
  panel: { flex: 1, borderWidth: 1, borderRadius: radii.lg, padding: spacing.xxl, gap: spacing.xl, justifyContent: 'center' },
  point: { flexDirection: 'row', gap: spacing.md, alignItems: 'flex-start' },
  pointText: { flex: 1 },
  phoneBrand: { alignItems: 'center', paddingTop: spacing.lg },
  card: { borderWidth: 1, borderRadius: radii.lg, padding: spacing.xl, gap: spacing.lg },
  cardWide: { width: maxFormWidth, padding: spacing.xxl, justifyContent: 'center' },
  heading: { gap: spacing.xs },
});
