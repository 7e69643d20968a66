import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import type { SendOutcome } from '@/lib/check-in-queue';
import { Banner } from '@/components/ui/banner';
import { AppText } from '@/components/ui/text';
import { SendStatus } from './send-status';

/** A session finished without a failed gate: recorded, and what the plan says now. */
export function SessionDone({ outcome }: { outcome: SendOutcome | undefined }) {
  const result = outcome?.status === 'saved' ? outcome.result : null;
  return (
    <View style={styles.wrap} testID="session-done">
      <AppText variant="title">Session recorded</AppText>
      <SendStatus outcome={outcome} />
      {result?.change ? <Banner tone="info">{result.change}</Banner> : null}
      <AppText tone="muted">
        Tomorrow morning Ritorno will ask how the area feels: symptoms can come later or the next day.
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.md } });
