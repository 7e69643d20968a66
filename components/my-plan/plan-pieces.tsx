import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { spacing } from '@/constants/theme';
import type { MyPiece } from '@/shared/schemas/my-plan';
import { Card } from '@/components/ui/card';
import { StatusBadge } from '@/components/ui/status-badge';
import { AppText } from '@/components/ui/text';

const when = (date: string | null) => (date ? `expected from ${format(parseISO(date), 'd MMMM')}` : 'no date yet');

/** The repertoire: what is cleared now and when the rest is expected. */
export function PlanPieces({ pieces }: { pieces: MyPiece[] }) {
  return (
    <Card testID="plan-pieces">
      <AppText variant="heading">Repertoire</AppText>
      {pieces.length === 0 ? <AppText tone="muted">Your clinician has not added pieces yet.</AppText> : null}
      {pieces.map((piece) => (
        <View key={piece.id} style={styles.piece}>
          <View style={styles.head}>
            <AppText variant="bodyStrong" style={styles.flex}>
              {piece.title}
            </AppText>
            {piece.cleared ? <StatusBadge tone="success" icon="checkmark-circle" label="Cleared" /> : <StatusBadge tone="neutral" icon="lock-closed-outline" label="Not yet" />}
          </View>
          <AppText variant="caption" tone="muted">
            {[piece.composer, `${piece.tier} tier`, piece.onProgramme ? 'on the event programme' : null, piece.cleared ? null : when(piece.expectedOn)].filter(Boolean).join(' · ')}
          </AppText>
          {piece.passages.map((passage) => (
            <AppText key={passage.bars} variant="caption">
              {`${passage.bars} (${passage.demands.join(', ')}): ${passage.cleared ? 'cleared, in short bursts' : when(passage.expectedOn)}`}
            </AppText>
          ))}
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  piece: { gap: spacing.xxs, paddingTop: spacing.sm },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  flex: { flex: 1 },
});
