import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { demandsInWords, tierWords } from '@/lib/repertoire-words';
import type { PieceRecord } from '@/shared/schemas/repertoire';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmDelete } from '@/components/ui/confirm-delete';
import { AppText } from '@/components/ui/text';
import { ClearanceBadge } from './clearance-badge';

export interface PieceRowProps {
  piece: PieceRecord;
  onEdit: () => void;
  onDelete: () => void;
  deleting: boolean;
  deleteError?: string | null;
}

export function PieceRow({ piece, onEdit, onDelete, deleting, deleteError }: PieceRowProps) {
  return (
    <Card testID="piece-row">
      <View style={styles.head}>
        <View style={styles.text}>
          <AppText variant="bodyStrong">{piece.title}</AppText>
          <AppText variant="caption" tone="muted">
            {`${piece.composer || 'Composer not given'} · ${tierWords[piece.tier]}${piece.onProgramme ? ' · on the programme' : ''}`}
          </AppText>
        </View>
        <ClearanceBadge clearance={piece.clearance} />
      </View>
      {piece.passages.map((passage) => (
        <AppText key={passage.bars} variant="caption">{`Demanding passage, ${passage.bars}: ${demandsInWords(passage.demands)}`}</AppText>
      ))}
      <View style={styles.actions}>
        <Button testID={`piece-edit-${piece.id}`} variant="secondary" icon="create-outline" label="Edit" accessibilityLabel={`Edit ${piece.title}`} onPress={onEdit} />
        <ConfirmDelete
          testID={`piece-delete-${piece.id}`}
          label="Remove"
          accessibilityLabel={`Remove ${piece.title}`}
          question={`Remove ‘${piece.title}’ from the repertoire?`}
          detail="Its tier and demanding passages go with it; the plan itself is not changed."
          busy={deleting}
          error={deleteError}
          onConfirm={onDelete}
        />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: spacing.sm },
  text: { flex: 1, minWidth: 200, gap: spacing.xxs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
