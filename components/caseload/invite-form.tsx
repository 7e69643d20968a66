import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useController, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { spacing } from '@/constants/theme';
import { useCreateInvitationMutation } from '@/hooks/use-invitations';
import { isApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import { CreateInvitationSchema, type CreateInvitation } from '@/shared/schemas/invitation';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { TextField } from '@/components/ui/text-field';

type InviteFormValues = z.input<typeof CreateInvitationSchema>;

const roleOptions = [
  { value: 'musician', label: 'Musician', testID: 'invite-role-musician' },
  { value: 'teacher', label: 'Teacher', testID: 'invite-role-teacher' },
] as const;

// Both roles start with every field empty; the schema drops a teacher's instrument.
const empty = (role: CreateInvitation['role']): InviteFormValues =>
  role === 'musician' ? { role, name: '', email: '', instrument: '' } : { role, name: '', email: '' };

/** Invites a musician (who joins the caseload at once) or a teacher; the e-mail carries a one-time link. */
export function InviteForm() {
  const create = useCreateInvitationMutation();
  const [notice, setNotice] = useState<{ tone: 'success' | 'warning' | 'danger'; text: string } | null>(null);
  const { control, handleSubmit, setError, reset } = useForm<InviteFormValues, unknown, CreateInvitation>({
    resolver: zodResolver(CreateInvitationSchema),
    defaultValues: empty('musician'),
  });
  const { field: roleField } = useController({ control, name: 'role' });
  const isMusician = roleField.value === 'musician';

  const submit = handleSubmit(async (values) => {
    setNotice(null);
    try {
      const sent = await create.mutateAsync(values);
      reset(empty(values.role));
      setNotice(
        sent.emailSent
          ? { tone: 'success', text: `Invitation sent to ${sent.name} at ${sent.email}. The link in it works for 7 days.` }
          : { tone: 'warning', text: `${sent.name} was added, but the e-mail could not be sent. Check the mail settings.` },
      );
    } catch (error) {
      if (isApiError(error) && error.code === 'email_taken') {
        setError('email', { type: 'server', message: error.message }, { shouldFocus: true });
        return;
      }
      const message = applyServerErrors(error, setError, ['name', 'email', 'instrument']);
      if (message) setNotice({ tone: 'danger', text: message });
    }
  });

  return (
    <View style={styles.form} testID="invite-form">
      {notice ? (
        <Banner tone={notice.tone} testID="invite-notice">
          {notice.text}
        </Banner>
      ) : null}
      <SegmentedControl label="Who are you inviting?" options={roleOptions} value={roleField.value} onChange={roleField.onChange} />
      <TextField control={control} name="name" label="Full name" testID="invite-name" autoComplete="off" />
      <TextField
        control={control}
        name="email"
        label="E-mail"
        testID="invite-email"
        autoComplete="off"
        keyboardType="email-address"
        autoCapitalize="none"
      />
      {isMusician ? (
        <TextField control={control} name="instrument" label="Instrument" hint="For example: violin, clarinet, piano." testID="invite-instrument" />
      ) : null}
      <Button
        testID="invite-submit"
        label={isMusician ? 'Send invitation to musician' : 'Send invitation to teacher'}
        icon="paper-plane-outline"
        onPress={submit}
        loading={create.isPending}
        fullWidth
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.lg } });
