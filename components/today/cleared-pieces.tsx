import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import type { ClearedPiece } from '@/shared/schemas/today';
import { Card } from '@/components/ui/card';
import { AppText } from '@/components/ui/text';
import { TIER_WORDS } from './step-words';

export interface ClearedPiecesProps {
  pieces: ClearedPiece[];
  maxBurstMinutes: number;
}

/** The repertoire cleared today, and its demanding passages: in short bursts once they are cleared. */
export function ClearedPieces({ pieces, maxBurstMinutes }: ClearedPiecesProps) {
  return (
    <Card testID="cleared-pieces">
      <AppText variant="heading">What you may play</AppText>
      {pieces.length === 0 ? <AppText tone="muted">Technical exercises only for now: no pieces are cleared yet.</AppText> : null}
      {pieces.map((piece) => (
        <View key={piece.id} style={styles.piece}>
          <AppText variant="bodyStrong">{piece.title}</AppText>
          <AppText variant="caption" tone="muted">{[piece.composer, `${TIER_WORDS[piece.tier]} tier`].filter(Boolean).join(' · ')}</AppText>
          {piece.passages.map((passage) => (
            <AppText key={passage.bars} variant="caption">
              {passage.cleared
                ? `${passage.bars}: in bursts of at most ${maxBurstMinutes} min between easier playing`
                : `${passage.bars}: leave out for now (not cleared yet)`}
            </AppText>
          ))}
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({ piece: { gap: spacing.xxs, paddingTop: spacing.xs } });
