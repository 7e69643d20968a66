import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { spacing } from '@/constants/theme';
import { useRequestPasswordResetMutation } from '@/hooks/use-auth';
import { applyServerErrors } from '@/lib/form-errors';
import { ForgotPasswordSchema } from '@/shared/schemas/auth';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { TextLink } from '@/components/ui/text-link';

export function ForgotPasswordForm() {
  const requestReset = useRequestPasswordResetMutation();
  const [formError, setFormError] = useState('');
  const [sentTo, setSentTo] = useState('');
  const { control, handleSubmit, setError } = useForm<
    z.input<typeof ForgotPasswordSchema>,
    unknown,
    z.output<typeof ForgotPasswordSchema>
  >({
    resolver: zodResolver(ForgotPasswordSchema),
    defaultValues: { email: '' },
  });

  const submit = handleSubmit(async (values) => {
    setFormError('');
    try {
      await requestReset.mutateAsync(values);
      setSentTo(values.email);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['email']));
    }
  });

  if (sentTo) {
    return (
      <View style={styles.form}>
        <Banner tone="success" title="Check your inbox" testID="forgot-sent">
          {`If ${sentTo} has a Ritorno account, a link to choose a new password is on its way. The link works for one hour.`}
        </Banner>
        <TextLink href="/sign-in" label="Back to sign in" testID="forgot-back" />
      </View>
    );
  }

  return (
    <View style={styles.form}>
      {formError ? (
        <Banner tone="danger" testID="forgot-error">
          {formError}
        </Banner>
      ) : null}
      <TextField
        control={control}
        name="email"
        label="E-mail"
        testID="forgot-email"
        autoComplete="email"
        keyboardType="email-address"
        autoCapitalize="none"
        onSubmitEditing={submit}
      />
      <Button testID="forgot-submit" label="Send reset link" onPress={submit} loading={requestReset.isPending} fullWidth />
      <TextLink href="/sign-in" label="Back to sign in" testID="forgot-back" />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.lg } });
