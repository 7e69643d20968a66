import { Pressable, StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { Link } from 'expo-router';
import { format } from 'date-fns/format';
import { radii, spacing, touchTarget } from '@/constants/theme';
import { isMailboxOff, useDevMailQuery } from '@/hooks/use-dev-mail';
import { useTheme } from '@/hooks/use-theme';
import { Banner } from '@/components/ui/banner';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { AppText } from '@/components/ui/text';

/** Messages the local fake SMTP server caught, newest first; each opens in full. */
export function MailList() {
  const { colors } = useTheme();
  const mail = useDevMailQuery();

  if (mail.isPending) return <LoadingState label="Loading the mailbox…" />;
  if (mail.isError) {
    if (isMailboxOff(mail.error)) {
      return (
        <Banner tone="info" title="No development mailbox" testID="mailbox-off">
          A real mail server is configured, so messages go to real inboxes and are not kept here.
        </Banner>
      );
    }
    return <ErrorState error={mail.error} onRetry={() => mail.refetch()} testID="mail-error" />;
  }
  if (mail.data.length === 0) {
    return (
      <EmptyState icon="mail-open-outline" title="The mailbox is empty" testID="mail-empty">
        Invitations and password-reset e-mails sent while developing will appear here.
      </EmptyState>
    );
  }
  const newestFirst = [...mail.data].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
  return (
    <View style={[styles.list, { borderColor: colors.border, backgroundColor: colors.surface }]}>
      {newestFirst.map((message, position) => (
        <Link key={message.id} href={{ pathname: '/mailbox/[id]', params: { id: message.id } }} asChild>
          <Pressable
            testID="mail-row"
            accessibilityRole="link"
            accessibilityLabel={`Open message: ${message.subject}, to ${message.to.join(', ')}`}
            style={StyleSheet.flatten([styles.row, position > 0 && { borderTopWidth: 1, borderTopColor: colors.border }])}
          >
            <View style={styles.text}>
              <AppText variant="bodyStrong" numberOfLines={1}>
                {message.subject}
              </AppText>
              <AppText variant="caption" tone="muted" numberOfLines={1}>
                {`To ${message.to.join(', ')} · ${format(new Date(message.receivedAt), 'd MMM, HH:mm')}`}
              </AppText>
            </View>
            <Icon name="chevron-forward" size={18} color={colors.textMuted} />
          </Pressable>
        </Link>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderWidth: 1, borderRadius: radii.lg, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, padding: spacing.md, minHeight: touchTarget + spacing.lg },
  text: { flex: 1, gap: spacing.xxs },
});
