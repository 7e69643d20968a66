import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useController, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { spacing } from '@/constants/theme';
import { useSavePieceMutation } from '@/hooks/use-pieces';
import { applyServerErrors } from '@/lib/form-errors';
import { CreatePieceSchema, type CreatePiece, type PieceRecord } from '@/shared/schemas/repertoire';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { TextField } from '@/components/ui/text-field';
import { PassageFields } from './passage-fields';
import { emptyPiece, pieceValues, type PieceFormValues } from './piece-form-values';

const tiers = [
  { value: 'easy', label: 'Easy', testID: 'piece-tier-easy' },
  { value: 'moderate', label: 'Moderate', testID: 'piece-tier-moderate' },
  { value: 'demanding', label: 'Demanding', testID: 'piece-tier-demanding' },
] as const;

/** Add a piece or change one; clearance is never typed here, it follows from the plan. */
export function PieceForm({ id, piece, onDone }: { id: string; piece: PieceRecord | null; onDone: () => void }) {
  const save = useSavePieceMutation(id);
  const [message, setMessage] = useState<string | null>(null);
  const { control, handleSubmit, setError, reset } = useForm<PieceFormValues, unknown, CreatePiece>({
    resolver: zodResolver(CreatePieceSchema),
    defaultValues: piece ? pieceValues(piece) : emptyPiece,
  });
  const { field: tier } = useController({ control, name: 'tier' });
  const { field: onProgramme } = useController({ control, name: 'onProgramme' });

  const submit = handleSubmit(async (values) => {
    setMessage(null);
    try {
      await save.mutateAsync({ pieceId: piece?.id, body: values });
      reset(emptyPiece);
      onDone();
    } catch (error) {
      const text = applyServerErrors(error, setError, ['title', 'composer', 'tier', 'onProgramme']);
      if (text) setMessage(text);
    }
  });

  return (
    <View style={styles.form} testID="piece-form">
      <TextField control={control} name="title" label="Title" testID="piece-title" />
      <TextField control={control} name="composer" label="Composer" testID="piece-composer" />
      <SegmentedControl label="Difficulty tier" options={tiers} value={tier.value} onChange={tier.onChange} />
      <ChoiceChips
        label="Event programme"
        options={[{ value: 'yes', label: 'On the event’s programme', testID: 'piece-on-programme' }]}
        selected={onProgramme.value ? ['yes'] : []}
        multiple
        onToggle={() => onProgramme.onChange(!onProgramme.value)}
      />
      <PassageFields control={control} />
      {message ? <Banner tone="danger" testID="piece-error">{message}</Banner> : null}
      <View style={styles.row}>
        <Button testID="piece-save" icon="save-outline" label={piece ? 'Save changes' : 'Add piece'} onPress={submit} loading={save.isPending} />
        <Button testID="piece-cancel" variant="ghost" label="Cancel" onPress={onDone} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
