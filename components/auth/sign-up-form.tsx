import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { spacing } from '@/constants/theme';
import { useSignUpMutation } from '@/hooks/use-auth';
import { applyServerErrors } from '@/lib/form-errors';
import { ClinicianSignUpSchema, PASSWORD_MIN_LENGTH } from '@/shared/schemas/auth';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { TextLink } from '@/components/ui/text-link';

export interface SignUpFormProps {
  onSignedUp: () => void;
}

/** Clinicians create their own account here; everyone else is invited by a clinician. */
export function SignUpForm({ onSignedUp }: SignUpFormProps) {
  const signUp = useSignUpMutation();
  const [formError, setFormError] = useState('');
  const { control, handleSubmit, setError } = useForm<
    z.input<typeof ClinicianSignUpSchema>,
    unknown,
    z.output<typeof ClinicianSignUpSchema>
  >({
    resolver: zodResolver(ClinicianSignUpSchema),
    defaultValues: { name: '', email: '', password: '' },
  });

  const submit = handleSubmit(async (values) => {
    setFormError('');
    try {
      await signUp.mutateAsync(values);
      onSignedUp();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['name', 'email', 'password']));
    }
  });

  return (
    <View style={styles.form}>
      {formError ? (
        <Banner tone="danger" testID="sign-up-error">
          {formError}
        </Banner>
      ) : null}
      <TextField control={control} name="name" label="Full name" testID="sign-up-name" autoComplete="name" />
      <TextField
        control={control}
        name="email"
        label="Work e-mail"
        testID="sign-up-email"
        autoComplete="email"
        keyboardType="email-address"
        autoCapitalize="none"
      />
      <TextField
        control={control}
        name="password"
        label="Password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        testID="sign-up-password"
        autoComplete="new-password"
        secret
        onSubmitEditing={submit}
      />
      <Button testID="sign-up-submit" label="Create clinician account" onPress={submit} loading={signUp.isPending} fullWidth />
      <TextLink href="/sign-in" label="Already have an account? Sign in" testID="sign-up-sign-in" />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.lg } });
