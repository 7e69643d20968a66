import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { radii, spacing } from '@/constants/theme';
import { useSentInvitationsQuery } from '@/hooks/use-invitations';
import { useTheme } from '@/hooks/use-theme';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { AppText } from '@/components/ui/text';
import { InvitationStatusBadge } from './invitation-status-badge';

/** Invitations this clinician has sent, newest first, with what became of each. */
export function InvitationList() {
  const { colors } = useTheme();
  const sent = useSentInvitationsQuery();

  if (sent.isPending) return <LoadingState label="Loading invitations…" />;
  if (sent.isError) return <ErrorState error={sent.error} onRetry={() => sent.refetch()} testID="invitations-error" />;
  if (sent.data.length === 0) {
    return (
      <AppText tone="muted" testID="invitations-empty">
        No invitations sent yet. The ones you send appear here until they are accepted or expire.
      </AppText>
    );
  }
  return (
    <View style={[styles.list, { borderColor: colors.border, backgroundColor: colors.surface }]} testID="invitation-list">
      {sent.data.map((invitation, position) => (
        <View
          key={invitation.id}
          testID="invitation-row"
          style={[styles.row, position > 0 && { borderTopWidth: 1, borderTopColor: colors.border }]}
        >
          <View style={styles.who}>
            <AppText variant="bodyStrong">{invitation.name}</AppText>
            <AppText variant="caption" tone="muted" numberOfLines={1}>
              {`${invitation.role === 'musician' ? 'Musician' : 'Teacher'} · ${invitation.email}`}
            </AppText>
            <AppText variant="caption" tone="muted">
              {invitation.status === 'pending'
                ? `Sent ${format(new Date(invitation.createdAt), 'd MMM yyyy')} · link valid until ${format(new Date(invitation.expiresAt), 'd MMM')}`
                : `Sent ${format(new Date(invitation.createdAt), 'd MMM yyyy')}`}
            </AppText>
          </View>
          <InvitationStatusBadge status={invitation.status} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderWidth: 1, borderRadius: radii.lg, overflow: 'hidden' },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm, padding: spacing.md },
  who: { flex: 1, minWidth: 200, gap: spacing.xxs },
});
