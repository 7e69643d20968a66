import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useController, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { spacing } from '@/constants/theme';
import { useOverrideMutation } from '@/hooks/use-plans';
import { isApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import { OverrideRequestSchema, type OverrideRequest } from '@/shared/schemas/plan';
import type { OverrideAction } from '@/shared/schemas/override';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { TextField } from '@/components/ui/text-field';

type Values = z.input<typeof OverrideRequestSchema>;

export const overrideWords: Record<OverrideAction, string> = {
  advance: 'Advance a stage',
  hold: 'Hold',
  resume: 'Resume',
  step_back: 'Step back a stage',
  clear_red_flag: 'Clear a red flag',
};

const options = (Object.keys(overrideWords) as OverrideAction[]).map((value) => ({ value, label: overrideWords[value], testID: `override-${value}` }));

/** The clinician changes the progression; every change needs a reason and is kept with who and when. */
export function OverrideForm({ id }: { id: string }) {
  const override = useOverrideMutation(id);
  const [notice, setNotice] = useState<{ tone: 'success' | 'warning' | 'danger'; text: string } | null>(null);
  const { control, handleSubmit, setError, reset } = useForm<Values, unknown, OverrideRequest>({
    resolver: zodResolver(OverrideRequestSchema),
    defaultValues: { action: 'hold', reason: '' },
  });
  const { field: action } = useController({ control, name: 'action' });

  const submit = handleSubmit(async (values) => {
    setNotice(null);
    try {
      const result = await override.mutateAsync(values);
      reset({ action: values.action, reason: '' });
      setNotice({ tone: 'success', text: `${overrideWords[values.action]} recorded for ${result.override.date}. The musician's plan follows it from the next day.` });
    } catch (error) {
      if (isApiError(error) && error.status === 409) {
        setNotice({ tone: 'warning', text: error.message });
        return;
      }
      const message = applyServerErrors(error, setError, ['reason', 'action']);
      if (message) setNotice({ tone: 'danger', text: message });
    }
  });

  return (
    <View style={styles.form} testID="override-form">
      <ChoiceChips label="Change to the progression" options={options} selected={[action.value]} onToggle={action.onChange} testID="override-action" />
      <TextField control={control} name="reason" label="Reason (kept in the plan's history)" testID="override-reason" hint="For example: reviewed in clinic, swelling settled." />
      {notice ? (
        <Banner tone={notice.tone} testID="override-notice">
          {notice.text}
        </Banner>
      ) : null}
      <Button testID="override-submit" label={`Record: ${overrideWords[action.value]}`} icon="create-outline" onPress={submit} loading={override.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.md } });
