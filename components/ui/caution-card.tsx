import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from './text';

export interface CautionCardProps {
  audience: 'musician' | 'clinician';
}

/** The standing safety note, shown wherever following the app could hurt someone. */
export function CautionCard({ audience }: CautionCardProps) {
  const { colors } = useTheme();
  const lines =
    audience === 'musician'
      ? [
          'Pain means stop. Put the instrument down and do not play through it.',
          'Numbness, tingling, weakness, night pain, swelling or loss of control: stop playing and contact your clinician promptly.',
          'Ritorno supports your clinician’s advice and never replaces it.',
        ]
      : [
          'Ritorno supports, and never replaces, a licensed clinician’s judgement.',
          'Red-flag symptoms need prompt clinical review. Follow local regulations and professional practice.',
        ];
  return (
    <View
      testID="caution-card"
      role="note"
      style={[styles.box, { backgroundColor: colors.warningSurface, borderColor: colors.warning }]}
    >
      <View style={styles.titleRow}>
        <Icon name="hand-left-outline" size={18} color={colors.warning} />
        <AppText variant="bodyStrong">Play safely</AppText>
      </View>
      {lines.map((line) => (
        <AppText key={line} variant="caption">
          {line}
        </AppText>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderRadius: radii.md, padding: spacing.md, gap: spacing.xs },
  titleRow: { flexDirection: 'row', gap: spacing.sm, alignItems: 'center' },
});
