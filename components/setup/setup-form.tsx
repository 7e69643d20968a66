import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useController, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { spacing } from '@/constants/theme';
import { useAddSetupItemMutation } from '@/hooks/use-setup';
import { applyServerErrors } from '@/lib/form-errors';
import { CreateSetupItemSchema, SETUP_KINDS, type CreateSetupItem } from '@/shared/schemas/setup';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { TextField } from '@/components/ui/text-field';
import { setupKindWords } from './setup-words';

type Values = z.input<typeof CreateSetupItemSchema>;
const empty: Values = { kind: 'seat_wedge', label: '', instructions: '', active: true };
const kinds = SETUP_KINDS.map((value) => ({ value, label: setupKindWords[value], testID: `setup-kind-${value}` }));

/** Prescribe a modification of the playing setup; the musician sees it as a reminder while active. */
export function SetupForm({ id }: { id: string }) {
  const add = useAddSetupItemMutation(id);
  const [message, setMessage] = useState<string | null>(null);
  const { control, handleSubmit, setError, reset } = useForm<Values, unknown, CreateSetupItem>({
    resolver: zodResolver(CreateSetupItemSchema),
    defaultValues: empty,
  });
  const { field: kind } = useController({ control, name: 'kind' });
  const submit = handleSubmit(async (values) => {
    setMessage(null);
    try {
      await add.mutateAsync(values);
      reset(empty);
    } catch (error) {
      const text = applyServerErrors(error, setError, ['kind', 'label', 'instructions']);
      if (text) setMessage(text);
    }
  });
  return (
    <View style={styles.form} testID="setup-form">
      <ChoiceChips label="Kind" options={kinds} selected={[kind.value]} onToggle={kind.onChange} testID="setup-kind" />
      <TextField control={control} name="label" label="Modification" hint="For example: wedge cushion, front edge 5 cm higher." testID="setup-label" />
      <TextField control={control} name="instructions" label="Instructions for the musician" testID="setup-instructions" />
      {message ? <Banner tone="danger" testID="setup-error">{message}</Banner> : null}
      <Button testID="setup-add" icon="add-outline" label="Add to the checklist" onPress={submit} loading={add.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.md } });
