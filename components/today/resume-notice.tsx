import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { clockText, currentStep, remainingMs, type SessionState } from './session-machine';
import { stepTitle } from './step-words';

export interface ResumeNoticeProps {
  /** The state as it came back from the device, before anything else happened. */
  restored: SessionState;
  onStartOver: () => void;
}

function whereWords(state: SessionState): string {
  const step = currentStep(state);
  const gates = state.gates.length;
  const answered = gates > 0 ? ` ${gates === 1 ? 'Your answer at the first pain check is' : `Your answers at ${gates} pain checks are`} kept.` : '';
  if (state.status === 'finished' || !step) return `Every block is done: say how it went to send it.${answered}`;
  if (step.kind === 'gate') return `You were at a pain check.${answered}`;
  return `${stepTitle(step)} is paused with ${clockText(remainingMs(state, 0))} to go: press Resume when you are ready.${answered}`;
}

/** Says the session came back from where it was left (timer paused), with the way to start again. */
export function ResumeNotice({ restored, onStartOver }: ResumeNoticeProps) {
  return (
    <View style={styles.wrap} testID="session-restored">
      <Banner tone="info" title="Picked up where you left off">
        {whereWords(restored)}
      </Banner>
      <Button testID="session-start-over" variant="secondary" icon="refresh" label="Start over" accessibilityLabel="Start this session over from the first check" onPress={onStartOver} />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.sm } });
