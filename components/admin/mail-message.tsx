import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { spacing } from '@/constants/theme';
import { useDevMailMessageQuery } from '@/hooks/use-dev-mail';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { AppText } from '@/components/ui/text';
import { LinkedText } from './linked-text';

/** One caught message: who sent it to whom, and its plain text with working links. */
export function MailMessage({ id }: { id: string }) {
  const message = useDevMailMessageQuery(id);
  if (message.isPending) return <LoadingState label="Opening the message…" />;
  if (message.isError) return <ErrorState error={message.error} onRetry={() => message.refetch()} testID="mail-message-error" />;
  const mail = message.data;
  return (
    <Card testID="mail-message">
      <AppText variant="heading">{mail.subject}</AppText>
      <View style={styles.meta}>
        <AppText variant="caption" tone="muted">{`From ${mail.from}`}</AppText>
        <AppText variant="caption" tone="muted">{`To ${mail.to.join(', ')}`}</AppText>
        <AppText variant="caption" tone="muted">{`Received ${format(new Date(mail.receivedAt), 'd MMMM yyyy, HH:mm')}`}</AppText>
      </View>
      <View style={styles.body}>
        <LinkedText testID="mail-body" text={mail.text.trimEnd()} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  meta: { gap: spacing.xxs },
  body: { paddingTop: spacing.md },
});
