import { useController, type Control } from 'react-hook-form';
import type { PlanSettings } from '@/shared/schemas/plan-settings';
import { Card } from '@/components/ui/card';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { Section } from '@/components/ui/section';
import { TextField } from '@/components/ui/text-field';
import type { PlanFormValues } from './plan-form';

const WEEKDAYS = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'];
const options = WEEKDAYS.map((label, i) => ({ value: i + 1, label, testID: `plan-rest-weekday-${i + 1}` }));

/** Days off each week (one a week by default), and which weekdays; none picked spreads them evenly. */
export function RestDaysFields({ control }: { control: Control<PlanFormValues, unknown, PlanSettings> }) {
  const { field, fieldState } = useController({ control, name: 'restWeekdays' });
  const picked = field.value;
  return (
    <Section title="Rest days" description="At least one day a week off is the usual advice." testID="plan-group-rest">
      <Card>
        <TextField control={control} name="restDaysPerWeek" label="Rest days per week" testID="plan-restDaysPerWeek" keyboardType="number-pad" />
        <ChoiceChips
          label="Which weekdays (leave all unpicked to spread them evenly)"
          options={options}
          selected={picked}
          multiple
          onToggle={(day) => field.onChange(picked.includes(day) ? picked.filter((d) => d !== day) : [...picked, day])}
          error={fieldState.error?.message}
          testID="plan-restWeekdays"
        />
      </Card>
    </Section>
  );
}
