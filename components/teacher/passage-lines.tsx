import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { demandsInWords } from '@/lib/repertoire-words';
import type { PieceClearanceView } from '@/shared/schemas/clearance';
import { AppText } from '@/components/ui/text';
import { ClearanceMark } from './clearance-mark';

/** The demanding passages of one piece; they may be cleared later than the piece itself. */
export function PassageLines({ passages, asOf }: { passages: PieceClearanceView['passages']; asOf: string }) {
  if (passages.length === 0) {
    return (
      <AppText variant="caption" tone="muted">
        No demanding passages
      </AppText>
    );
  }
  return (
    <View style={styles.list}>
      {passages.map((passage) => (
        <View key={passage.bars} style={styles.item} testID="passage-line">
          <AppText variant="label">{`${passage.bars} (${demandsInWords(passage.demands)})`}</AppText>
          <ClearanceMark cleared={passage.cleared} expectedOn={passage.expectedOn} asOf={asOf} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  item: { gap: spacing.xxs },
});
