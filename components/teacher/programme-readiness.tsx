import { StyleSheet, View } from 'react-native';
import { radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { StudentClearance } from '@/shared/schemas/clearance';
import { Card } from '@/components/ui/card';
import { AppText } from '@/components/ui/text';

/** How much of the event programme is cleared, in words first and a bar second. */
export function ProgrammeReadiness({ clearance }: { clearance: StudentClearance }) {
  const { colors } = useTheme();
  const { total, cleared, fullyCleared } = clearance.programme;
  if (total === 0) {
    return (
      <AppText tone="muted" testID="programme-readiness">
        No pieces are on the event programme yet.
      </AppText>
    );
  }
  const share = cleared / total;
  return (
    <Card testID="programme-readiness">
      <AppText variant="heading">{`${cleared} of ${total} programme pieces cleared`}</AppText>
      <View
        accessibilityRole="progressbar"
        accessibilityLabel="Programme pieces cleared"
        accessibilityValue={{ min: 0, max: total, now: cleared }}
        style={[styles.track, { backgroundColor: colors.surfaceMuted, borderColor: colors.border }]}
      >
        <View style={[styles.fill, { width: `${Math.round(share * 100)}%`, backgroundColor: colors.success }]} />
      </View>
      <AppText variant="caption" tone="muted">
        {cleared === 0
          ? 'None is cleared yet; the projected dates are below.'
          : fullyCleared === cleared
            ? `${fullyCleared} of ${total} may be played in full, demanding passages included.`
            : `${fullyCleared} of ${total} may be played in full; demanding passages of the other cleared pieces come later.`}
      </AppText>
    </Card>
  );
}

const styles = StyleSheet.create({
  track: { height: 12, borderRadius: radii.pill, borderWidth: 1, overflow: 'hidden' },
  fill: { height: '100%', borderRadius: radii.pill },
});
