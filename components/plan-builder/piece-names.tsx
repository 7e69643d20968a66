import { View } from 'react-native';
import type { Piece } from '@/shared/scheduler';
import { AppText } from '@/components/ui/text';

/** A titled list of pieces; nothing when empty. */
export function PieceNames({ title, pieces, testID }: { title: string; pieces: readonly Piece[]; testID: string }) {
  if (pieces.length === 0) return null;
  return (
    <View testID={testID}>
      <AppText variant="label">{title}</AppText>
      {pieces.map((piece) => (
        <AppText key={piece.id ?? piece.title} variant="caption">{`• ${piece.title}${piece.composer ? `, ${piece.composer}` : ''}`}</AppText>
      ))}
    </View>
  );
}
