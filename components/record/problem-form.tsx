import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useController, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { spacing } from '@/constants/theme';
import { useUpdateProfileMutation } from '@/hooks/use-record';
import { applyServerErrors } from '@/lib/form-errors';
import { UpdateMusicianProfileSchema, type MusicianProfile, type ProblemSide, type UpdateMusicianProfile } from '@/shared/schemas/record';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { TextField } from '@/components/ui/text-field';

type Values = z.input<typeof UpdateMusicianProfileSchema>;

const sides: { value: ProblemSide; label: string; testID: string }[] = [
  { value: 'left', label: 'Left', testID: 'problem-side-left' },
  { value: 'right', label: 'Right', testID: 'problem-side-right' },
  { value: 'both', label: 'Both', testID: 'problem-side-both' },
  { value: 'midline', label: 'Midline', testID: 'problem-side-midline' },
];

const valuesOf = (profile: MusicianProfile): Values => ({
  name: profile.name,
  instrument: profile.instrument,
  problem: {
    region: profile.problem.region ?? '',
    side: profile.problem.side,
    onset: profile.problem.onset ?? '',
    summary: profile.problem.summary ?? '',
  },
});

/** Profile and the presenting problem: the clinician's only, never shown to a teacher or e-mailed. */
export function ProblemForm({ id, profile }: { id: string; profile: MusicianProfile }) {
  const update = useUpdateProfileMutation(id);
  const [notice, setNotice] = useState<{ tone: 'success' | 'danger'; text: string } | null>(null);
  const { control, handleSubmit, setError, reset } = useForm<Values, unknown, UpdateMusicianProfile>({
    resolver: zodResolver(UpdateMusicianProfileSchema),
    defaultValues: valuesOf(profile),
  });
  const { field: side } = useController({ control, name: 'problem.side' });

  const submit = handleSubmit(async (values) => {
    setNotice(null);
    try {
      const saved = await update.mutateAsync(values);
      reset(valuesOf(saved));
      setNotice({ tone: 'success', text: 'Saved.' });
    } catch (error) {
      const message = applyServerErrors(error, setError, ['name', 'instrument', 'problem.region', 'problem.side', 'problem.onset', 'problem.summary']);
      if (message) setNotice({ tone: 'danger', text: message });
    }
  });

  return (
    <View style={styles.form} testID="problem-form">
      <TextField control={control} name="name" label="Name" testID="profile-name" />
      <TextField control={control} name="instrument" label="Instrument" testID="profile-instrument" />
      <TextField control={control} name="problem.region" label="Region" hint="For example: right thumb and forearm." testID="problem-region" />
      <ChoiceChips
        label="Side"
        options={sides}
        selected={side.value ? [side.value] : []}
        onToggle={(value) => side.onChange(side.value === value ? null : value)}
        testID="problem-side"
      />
      <TextField control={control} name="problem.onset" label="Onset" hint="When and how it began." testID="problem-onset" />
      <TextField control={control} name="problem.summary" label="Summary" testID="problem-summary" />
      {notice ? (
        <Banner tone={notice.tone} testID="problem-notice">
          {notice.text}
        </Banner>
      ) : null}
      <Button testID="problem-save" label="Save profile" icon="save-outline" onPress={submit} loading={update.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.md } });
