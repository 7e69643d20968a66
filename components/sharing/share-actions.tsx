import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useStopSharingMutation, useWithdrawInvitationMutation } from '@/hooks/use-shares';
import { isApiError } from '@/lib/api-client';
import type { Share } from '@/shared/schemas/share';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { AppText } from '@/components/ui/text';

function messageOf(error: unknown): string {
  return isApiError(error) ? error.message : 'Something went wrong. Please try again.';
}

/** Stop sharing (after a confirmation, effective at once) or withdraw an open invitation. */
export function ShareActions({ share }: { share: Share }) {
  const stop = useStopSharingMutation();
  const withdraw = useWithdrawInvitationMutation();
  const [confirming, setConfirming] = useState(false);
  const failure = stop.error ?? withdraw.error;
  const teacherId = share.teacherId;

  return (
    <View style={styles.box}>
      {failure ? (
        <Banner tone="danger" testID="share-action-error">
          {messageOf(failure)}
        </Banner>
      ) : null}
      {teacherId === null ? (
        <Button
          testID="share-withdraw"
          label="Withdraw invitation"
          accessibilityLabel={`Withdraw the invitation to ${share.name}`}
          icon="close-circle-outline"
          variant="secondary"
          loading={withdraw.isPending}
          onPress={() => withdraw.mutate(share.email)}
        />
      ) : confirming ? (
        <View style={styles.confirm} testID="share-stop-confirmation" accessibilityLiveRegion="polite">
          <AppText variant="bodyStrong">{`Stop sharing with ${share.name}?`}</AppText>
          <AppText variant="caption" tone="muted">
            They lose access to your clearance straight away. You can share with them again later.
          </AppText>
          <View style={styles.buttons}>
            <Button
              testID="share-stop-confirm"
              label="Stop sharing"
              accessibilityLabel={`Yes, stop sharing with ${share.name}`}
              icon="eye-off-outline"
              loading={stop.isPending}
              onPress={() => stop.mutate(teacherId, { onSuccess: () => setConfirming(false) })}
            />
            <Button testID="share-stop-cancel" label="Keep sharing" variant="ghost" onPress={() => setConfirming(false)} />
          </View>
        </View>
      ) : (
        <Button
          testID="share-stop"
          label="Stop sharing"
          accessibilityLabel={`Stop sharing with ${share.name}`}
          icon="eye-off-outline"
          variant="secondary"
          onPress={() => setConfirming(true)}
        />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm },
  confirm: { gap: spacing.xs },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, marginTop: spacing.xs },
});
