import { useController, type Control } from 'react-hook-form';
import { DemandSchema, type Demand } from '@/shared/schemas/piece';
import type { CreatePiece } from '@/shared/schemas/repertoire';
import { ChoiceChips } from '@/components/ui/choice-chips';
import type { PieceFormValues } from './piece-form-values';

type PieceControl = Control<PieceFormValues, unknown, CreatePiece>;

/** What makes one passage demanding: speed, loudness, range, stretch, endurance (one or more). */
export function PassageDemands({ control, index }: { control: PieceControl; index: number }) {
  const { field, fieldState } = useController({ control, name: `passages.${index}.demands` });
  const picked = field.value ?? [];
  const options = DemandSchema.options.map((value) => ({ value, label: value[0]?.toUpperCase() + value.slice(1), testID: `passage-${index}-demand-${value}` }));
  return (
    <ChoiceChips
      label="What makes it demanding"
      options={options}
      selected={picked}
      multiple
      onToggle={(value: Demand) => field.onChange(picked.includes(value) ? picked.filter((d) => d !== value) : [...picked, value])}
      error={fieldState.error?.message}
      testID={`passage-${index}-demands`}
    />
  );
}

