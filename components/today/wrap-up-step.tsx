import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { Button } from '@/components/ui/button';
import { AppText } from '@/components/ui/text';
import { EffortPicker } from './effort-picker';

export interface WrapUpStepProps {
  /** Minutes played as the timer counted them. */
  timedMinutes: number;
  onSave: (effort: number, minutesPlayed: number) => void;
}

/** The end of a session: how hard it felt (CR-10) and the minutes actually played, prefilled. */
export function WrapUpStep({ timedMinutes, onSave }: WrapUpStepProps) {
  const [effort, setEffort] = useState<number | null>(null);
  const [minutes, setMinutes] = useState(timedMinutes);
  return (
    <View style={styles.wrap} testID="wrap-up">
      <AppText variant="title">Well done</AppText>
      <EffortPicker value={effort} onChange={setEffort} />
      <View style={styles.block}>
        <AppText variant="bodyStrong">Minutes you actually played</AppText>
        <View style={styles.stepper}>
          <Button testID="minutes-less" label="−" accessibilityLabel="One minute less" variant="secondary" onPress={() => setMinutes((m) => Math.max(0, m - 1))} />
          <AppText testID="minutes-played" variant="title" accessibilityLabel={`${minutes} minutes`}>
            {`${minutes} min`}
          </AppText>
          <Button testID="minutes-more" label="+" accessibilityLabel="One minute more" variant="secondary" onPress={() => setMinutes((m) => Math.min(24 * 60, m + 1))} />
        </View>
        <AppText variant="caption" tone="muted">{`The timer counted ${timedMinutes} min of blocks. Change it if you stopped early or played on.`}</AppText>
      </View>
      <Button
        testID="wrap-up-save"
        label={effort === null ? 'Choose how hard it felt' : 'Save session'}
        icon="checkmark"
        fullWidth
        disabled={effort === null}
        onPress={() => {
          if (effort !== null) onSave(effort, minutes);
        }}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
  block: { gap: spacing.sm },
  stepper: { flexDirection: 'row', alignItems: 'center', gap: spacing.lg },
});
