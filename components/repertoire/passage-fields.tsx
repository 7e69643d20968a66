import { StyleSheet, View } from 'react-native';
import { useFieldArray, type Control } from 'react-hook-form';
import { radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { CreatePiece } from '@/shared/schemas/repertoire';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { PassageDemands } from './passage-demands';
import type { PieceFormValues } from './piece-form-values';

type PieceControl = Control<PieceFormValues, unknown, CreatePiece>;

/** Demanding passages of a piece: which bars, and what makes them demanding on the body. */
export function PassageFields({ control }: { control: PieceControl }) {
  const { colors } = useTheme();
  const { fields, append, remove } = useFieldArray({ control, name: 'passages' });
  return (
    <View style={styles.list}>
      {fields.map((item, index) => (
        <View key={item.id} style={[styles.passage, { borderColor: colors.border }]} testID="passage-fields">
          <TextField control={control} name={`passages.${index}.bars`} label="Bars" hint="For example: bars 60-95." testID={`passage-${index}-bars`} />
          <PassageDemands control={control} index={index} />
          <Button testID={`passage-${index}-remove`} variant="ghost" icon="trash-outline" label="Remove this passage" onPress={() => remove(index)} />
        </View>
      ))}
      <Button testID="passage-add" variant="secondary" icon="add-outline" label="Add a demanding passage" onPress={() => append({ bars: '', demands: [] })} />
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  passage: { gap: spacing.sm, padding: spacing.md, borderWidth: 1, borderRadius: radii.md },
});
