import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { tierWords } from '@/lib/repertoire-words';
import type { PieceClearanceView } from '@/shared/schemas/clearance';
import { AppText } from '@/components/ui/text';

/** Title, composer, difficulty tier and whether the piece is on the event programme. */
export function PieceTitle({ piece }: { piece: PieceClearanceView }) {
  const details = [piece.composer, `${tierWords[piece.tier]} tier`, piece.onProgramme ? 'On the programme' : null]
    .filter((part): part is string => Boolean(part))
    .join(' · ');
  return (
    <View style={styles.box}>
      <AppText variant="bodyStrong">{piece.title}</AppText>
      <AppText variant="caption" tone="muted">
        {details}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: spacing.xxs, flexShrink: 1 } });
