import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { spacing } from '@/constants/theme';
import { useSignInMutation } from '@/hooks/use-auth';
import { applyServerErrors } from '@/lib/form-errors';
import { SignInSchema } from '@/shared/schemas/auth';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { TextLink } from '@/components/ui/text-link';
import { AppText } from '@/components/ui/text';

export interface SignInFormProps {
  onSignedIn: () => void;
}

export function SignInForm({ onSignedIn }: SignInFormProps) {
  const signIn = useSignInMutation();
  const [formError, setFormError] = useState('');
  const { control, handleSubmit, setError } = useForm<z.input<typeof SignInSchema>, unknown, z.output<typeof SignInSchema>>({
    resolver: zodResolver(SignInSchema),
    defaultValues: { email: '', password: '' },
  });

  const submit = handleSubmit(async (values) => {
    setFormError('');
    try {
      await signIn.mutateAsync(values);
      onSignedIn();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['email', 'password']));
    }
  });

  return (
    <View style={styles.form}>
      {formError ? (
        <Banner tone="danger" testID="sign-in-error">
          {formError}
        </Banner>
      ) : null}
      <TextField
        control={control}
        name="email"
        label="E-mail"
        testID="sign-in-email"
        autoComplete="email"
        keyboardType="email-address"
        autoCapitalize="none"
        returnKeyType="next"
      />
      <TextField
        control={control}
        name="password"
        label="Password"
        testID="sign-in-password"
        autoComplete="current-password"
        secret
        returnKeyType="go"
        onSubmitEditing={submit}
      />
      <Button testID="sign-in-submit" label="Sign in" onPress={submit} loading={signIn.isPending} fullWidth />
      <View style={styles.links}>
        <TextLink href="/forgot-password" label="Forgot your password?" testID="sign-in-forgot" />
        <TextLink href="/sign-up" label="New clinician? Create an account" testID="sign-in-sign-up" />
      </View>
      <AppText variant="caption" tone="muted">
        Musicians and teachers join through the invitation e-mail their clinician sends.
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  links: { gap: spacing.xxs },
});
