import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { spacing } from '@/constants/theme';
import { useSignInMutation } from '@/hooks/use-auth';
import { useAcceptInvitationMutation } from '@/hooks/use-invitations';
import { applyServerErrors } from '@/lib/form-errors';
import { PASSWORD_MIN_LENGTH } from '@/shared/schemas/auth';
import { AcceptInvitationSchema } from '@/shared/schemas/invitation';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';

export interface AcceptInvitationFormProps {
  token: string;
  onSignedIn: () => void;
}

/** Sets the password for an invited account, then signs the new account in with it. */
export function AcceptInvitationForm({ token, onSignedIn }: AcceptInvitationFormProps) {
  const accept = useAcceptInvitationMutation(token);
  const signIn = useSignInMutation();
  const [formError, setFormError] = useState('');
  const { control, handleSubmit, setError } = useForm<
    z.input<typeof AcceptInvitationSchema>,
    unknown,
    z.output<typeof AcceptInvitationSchema>
  >({
    resolver: zodResolver(AcceptInvitationSchema),
    defaultValues: { password: '' },
  });

  const submit = handleSubmit(async (values) => {
    setFormError('');
    try {
      const account = await accept.mutateAsync(values);
      await signIn.mutateAsync({ email: account.email, password: values.password });
      onSignedIn();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['password']));
    }
  });

  return (
    <View style={styles.form}>
      {formError ? (
        <Banner tone="danger" testID="accept-error">
          {formError}
        </Banner>
      ) : null}
      <TextField
        control={control}
        name="password"
        label="Choose a password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. You will use it with your e-mail to sign in.`}
        testID="accept-password"
        autoComplete="new-password"
        secret
        onSubmitEditing={submit}
      />
      <Button
        testID="accept-submit"
        label="Set password and sign in"
        onPress={submit}
        loading={accept.isPending || signIn.isPending}
        fullWidth
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.lg } });
