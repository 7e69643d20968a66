import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import type { SendOutcome } from '@/lib/check-in-queue';
import { Banner } from '@/components/ui/banner';
import { AppText } from '@/components/ui/text';
import { SendStatus } from './send-status';

/** What a morning check or pain report led to, once the server has it. */
export function CheckOutcome({ outcome, testID }: { outcome: SendOutcome | undefined; testID: string }) {
  const result = outcome?.status === 'saved' ? outcome.result : null;
  return (
    <View style={styles.wrap} testID={testID}>
      <SendStatus outcome={outcome} />
      {result?.redFlag ? (
        <Banner tone="danger" title="Stop playing and seek prompt clinical review" testID="red-flag-caution">
          All playing is stopped until your clinician clears it. Contact your clinician or an urgent care service if it gets worse.
        </Banner>
      ) : result?.stopPlaying ? (
        <Banner tone="warning" title="No more playing today" testID="pain-stop">
          Rest. Pain is a signal to stop, not to push through.
        </Banner>
      ) : null}
      {result?.change ? <AppText>{result.change}</AppText> : null}
      {result?.clinicianNotified ? <AppText variant="bodyStrong">Your clinician has been told.</AppText> : null}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.sm } });
