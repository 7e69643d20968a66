import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from '@/components/ui/text';
import { Card } from '@/components/ui/card';
import type { PieceClearanceView } from '@/shared/schemas/clearance';
import { ClearanceMark } from './clearance-mark';
import { PassageLines } from './passage-lines';
import { PieceTitle } from './piece-title';

/** One piece on a phone: title, whether it is cleared (or when it is expected), then its passages. */
export function PieceCard({ piece, asOf, testID }: { piece: PieceClearanceView; asOf: string; testID?: string }) {
  const { colors } = useTheme();
  return (
    <Card testID={testID}>
      <PieceTitle piece={piece} />
      <ClearanceMark cleared={piece.cleared} expectedOn={piece.expectedOn} asOf={asOf} />
      {piece.passages.length > 0 ? (
        <View style={[styles.passages, { borderTopColor: colors.border }]}>
          <AppText variant="label" tone="muted">
            Demanding passages
          </AppText>
          <PassageLines passages={piece.passages} asOf={asOf} />
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  passages: { borderTopWidth: 1, paddingTop: spacing.sm, marginTop: spacing.xs, gap: spacing.xs },
});
