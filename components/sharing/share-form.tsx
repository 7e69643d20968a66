import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { spacing } from '@/constants/theme';
import { useCreateShareMutation } from '@/hooks/use-shares';
import { isApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import { CreateShareSchema, type CreateShare } from '@/shared/schemas/share';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';

type ShareFormValues = z.input<typeof CreateShareSchema>;

const empty: ShareFormValues = { name: '', email: '' };

/** Adds a teacher or ensemble director: shared at once if they have an account, invited by e-mail if not. */
export function ShareForm() {
  const create = useCreateShareMutation();
  const [notice, setNotice] = useState<{ tone: 'success' | 'danger'; text: string } | null>(null);
  const { control, handleSubmit, setError, reset } = useForm<ShareFormValues, unknown, CreateShare>({
    resolver: zodResolver(CreateShareSchema),
    defaultValues: empty,
  });

  const submit = handleSubmit(async (values) => {
    setNotice(null);
    try {
      const shares = await create.mutateAsync(values);
      const added = shares.find((share) => share.email.toLowerCase() === values.email.toLowerCase());
      reset(empty);
      setNotice({
        tone: 'success',
        text:
          added?.status === 'invited'
            ? `We e-mailed ${values.name} an invitation. They see your clearance once they join.`
            : `${values.name} can now see your clearance.`,
      });
    } catch (error) {
      if (isApiError(error) && error.status === 409) {
        setError('email', { type: 'server', message: error.message }, { shouldFocus: true });
        return;
      }
      const message = applyServerErrors(error, setError, ['name', 'email']);
      if (message) setNotice({ tone: 'danger', text: message });
    }
  });

  return (
    <View style={styles.form} testID="share-form">
      {notice ? (
        <Banner tone={notice.tone} testID="share-notice">
          {notice.text}
        </Banner>
      ) : null}
      <TextField control={control} name="name" label="Their name" testID="share-name" autoComplete="off" />
      <TextField
        control={control}
        name="email"
        label="Their e-mail"
        testID="share-email"
        autoComplete="off"
        keyboardType="email-address"
        autoCapitalize="none"
      />
      <Button
        testID="share-submit"
        label="Share my clearance"
        icon="share-social-outline"
        onPress={submit}
        loading={create.isPending}
        fullWidth
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.lg } });
