import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useInvitationPreviewQuery } from '@/hooks/use-invitations';
import { isApiError } from '@/lib/api-client';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { LoadingState } from '@/components/ui/loading-state';
import { AppText } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { AcceptInvitationForm } from './accept-invitation-form';

// "4 March 2027" as date-fns wrote it, from the browser's own Intl: date-fns stays out of the sign-in screens' JavaScript.
// Made on first use: building a formatter costs a phone tens of milliseconds, and every route module runs
// at start-up while only an invitation link shows the date.
let expiryDate: Intl.DateTimeFormat | undefined;
const formatExpiry = (iso: string) =>
  (expiryDate ??= new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric' })).format(new Date(iso));

export interface InvitationAcceptanceProps {
  token: string;
  onSignedIn: () => void;
}

/** Shows who sent the invitation and for which role, then lets the person set a password. */
export function InvitationAcceptance({ token, onSignedIn }: InvitationAcceptanceProps) {
  const preview = useInvitationPreviewQuery(token);

  if (preview.isPending) return <LoadingState label="Opening your invitation…" />;
  if (preview.isError) {
    const message = isApiError(preview.error) ? preview.error.message : 'This invitation could not be opened.';
    return (
      <View style={styles.box}>
        <Banner tone="danger" title="This link does not work" testID="invitation-error">
          {message}
        </Banner>
        <TextLink href="/sign-in" label="Go to sign in" testID="invitation-sign-in" />
      </View>
    );
  }

  const invitation = preview.data;
  const purpose =
    invitation.role === 'musician'
      ? 'You will see today’s playing programme and report how it went.'
      : 'You will see which repertoire your students are cleared to play and for how long.';
  return (
    <View style={styles.box}>
      <Card muted testID="invitation-preview">
        <AppText variant="bodyStrong">{`${invitation.invitedBy} invited you as a ${invitation.role}.`}</AppText>
        <AppText>{purpose}</AppText>
        <AppText variant="caption" tone="muted">
          {`Account: ${invitation.name}, ${invitation.email}. The link expires on ${formatExpiry(invitation.expiresAt)}.`}
        </AppText>
      </Card>
      <AcceptInvitationForm token={token} onSignedIn={onSignedIn} />
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: spacing.lg } });
