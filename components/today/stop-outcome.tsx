import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import type { SendOutcome } from '@/lib/check-in-queue';
import { Banner } from '@/components/ui/banner';
import { CautionCard } from '@/components/ui/caution-card';
import { AppText } from '@/components/ui/text';
import { SendStatus } from './send-status';

export interface StopOutcomeProps {
  reason: 'pain' | 'red_flag';
  outcome: SendOutcome | undefined;
}

/** After a gate ended the session: stop and rest, what happens to the plan, and who has been told. */
export function StopOutcome({ reason, outcome }: StopOutcomeProps) {
  const result = outcome?.status === 'saved' ? outcome.result : null;
  return (
    <View style={styles.wrap} testID="stop-outcome">
      {reason === 'red_flag' ? (
        <Banner tone="danger" title="Stop playing and seek prompt clinical review" testID="red-flag-caution">
          {
            'Numbness, tingling, weakness or loss of control need a clinician to look at them; night pain or a hot, swollen joint need urgent review. All playing is stopped until your clinician clears it. If it gets worse, contact your clinician or an urgent care service today.'
          }
        </Banner>
      ) : (
        <Banner tone="warning" title="Stop and rest" testID="pain-stop">
          Put the instrument down. Pain is a signal to stop, not to push through. No more playing today.
        </Banner>
      )}
      <View style={styles.block}>
        <AppText variant="heading">What happens next</AppText>
        {result?.change ? <AppText testID="stop-change">{result.change}</AppText> : null}
        {!result?.change ? (
          <AppText>
            {reason === 'red_flag'
              ? 'Your plan is paused until your clinician has reviewed you.'
              : 'Your plan holds at this stage, or steps back one stage if pain keeps coming back.'}
          </AppText>
        ) : null}
        {result?.clinicianNotified ? (
          <AppText testID="clinician-notified" variant="bodyStrong">
            Your clinician has been told.
          </AppText>
        ) : null}
        <SendStatus outcome={outcome} />
      </View>
      <CautionCard audience="musician" />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.lg }, block: { gap: spacing.sm } });
