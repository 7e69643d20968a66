import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useDeletePieceMutation, usePiecesQuery } from '@/hooks/use-pieces';
import type { PieceRecord } from '@/shared/schemas/repertoire';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Section } from '@/components/ui/section';
import { AppText } from '@/components/ui/text';
import { PieceForm } from './piece-form';
import { PieceRow } from './piece-row';

/** The musician's pieces with their clearance (derived from the plan), and a form to add or edit one. */
export function RepertoireTab({ id }: { id: string }) {
  const pieces = usePiecesQuery(id);
  const remove = useDeletePieceMutation(id);
  const [editing, setEditing] = useState<PieceRecord | 'new' | null>(null);
  return (
    <Section title="Repertoire" description="Clearance follows the plan's stage and tiers; it is never typed in." testID="record-repertoire">
      {editing ? (
        <Card>
          <PieceForm key={editing === 'new' ? 'new' : editing.id} id={id} piece={editing === 'new' ? null : editing} onDone={() => setEditing(null)} />
        </Card>
      ) : (
        <Button testID="piece-new" icon="add-circle-outline" label="Add a piece" onPress={() => setEditing('new')} />
      )}
      {pieces.isPending ? <LoadingState label="Loading pieces…" /> : null}
      {pieces.isError ? <ErrorState error={pieces.error} onRetry={() => pieces.refetch()} testID="pieces-error" /> : null}
      {pieces.data?.length === 0 ? <AppText tone="muted">No pieces yet.</AppText> : null}
      <View style={styles.list}>
        {pieces.data?.map((piece) => (
          <PieceRow
            key={piece.id}
            piece={piece}
            onEdit={() => setEditing(piece)}
            onDelete={() => remove.mutate(piece.id)}
            deleting={remove.isPending && remove.variables === piece.id}
            deleteError={remove.isError && remove.variables === piece.id ? remove.error.message : null}
          />
        ))}
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({ list: { gap: spacing.sm } });
