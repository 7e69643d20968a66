import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { spacing } from '@/constants/theme';
import { useResetPasswordMutation } from '@/hooks/use-auth';
import { useTakenOver } from '@/hooks/use-taken-over';
import { applyServerErrors } from '@/lib/form-errors';
import { PASSWORD_MIN_LENGTH, ResetPasswordSchema } from '@/shared/schemas/auth';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { TextLink } from '@/components/ui/text-link';

export interface ResetPasswordFormProps {
  token: string;
}

export function ResetPasswordForm({ token }: ResetPasswordFormProps) {
  const reset = useResetPasswordMutation();
  // The server draws the page without the link's token: say it is missing only once the app runs.
  const takenOver = useTakenOver();
  const [formError, setFormError] = useState('');
  const [done, setDone] = useState(false);
  const { control, handleSubmit, setError, formState } = useForm<
    z.input<typeof ResetPasswordSchema>,
    unknown,
    z.output<typeof ResetPasswordSchema>
  >({
    resolver: zodResolver(ResetPasswordSchema),
    defaultValues: { token, password: '' },
  });

  const submit = handleSubmit(async (values) => {
    setFormError('');
    try {
      await reset.mutateAsync(values);
      setDone(true);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['password']));
    }
  });

  if (done) {
    return (
      <View style={styles.form}>
        <Banner tone="success" title="Password changed" testID="reset-done">
          Sign in with your new password. Other devices were signed out.
        </Banner>
        <TextLink href="/sign-in" label="Go to sign in" testID="reset-sign-in" />
      </View>
    );
  }

  const tokenError = formState.errors.token?.message;
  return (
    <View style={styles.form}>
      {tokenError || (!token && takenOver) ? (
        <Banner tone="danger" testID="reset-token-error">
          {tokenError ?? 'This reset link is incomplete. Open the link from the e-mail again, or ask for a new one.'}
        </Banner>
      ) : null}
      {formError ? (
        <Banner tone="danger" testID="reset-error">
          {formError}
        </Banner>
      ) : null}
      <TextField
        control={control}
        name="password"
        label="New password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        testID="reset-password"
        autoComplete="new-password"
        secret
        onSubmitEditing={submit}
      />
      <Button testID="reset-submit" label="Save new password" onPress={submit} loading={reset.isPending} fullWidth />
      <TextLink href="/forgot-password" label="Ask for a new link" testID="reset-new-link" />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.lg } });
