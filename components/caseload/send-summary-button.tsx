import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useSendSummaryMutation } from '@/hooks/use-musicians';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';

/** Sends the weekly caseload summary e-mail now, and says where it went. */
export function SendSummaryButton() {
  const send = useSendSummaryMutation();
  return (
    <View style={styles.wrap}>
      <Button
        testID="send-summary"
        label="Send weekly summary now"
        icon="mail-outline"
        variant="secondary"
        loading={send.isPending}
        onPress={() => send.mutate()}
      />
      {send.isSuccess ? (
        <Banner tone="success" testID="send-summary-notice">
          {`Summary of ${send.data.musicianCount} musician${send.data.musicianCount === 1 ? '' : 's'} (${send.data.week}) sent to ${send.data.to}.`}
        </Banner>
      ) : null}
      {send.isError ? (
        <Banner tone="danger" testID="send-summary-error">
          {send.error.message}
        </Banner>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.sm, maxWidth: 420 } });
