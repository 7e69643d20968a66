import { StyleSheet, View } from 'react-native';
import { fonts, radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { ClearedPiece } from '@/shared/schemas/today';
import { Button } from '@/components/ui/button';
import { AppText } from '@/components/ui/text';
import { clockText, type SessionStep } from './session-machine';
import { stepTitle, whatToPlay } from './step-words';

export interface TimerStepProps {
  step: Extract<SessionStep, { kind: 'timed' }>;
  remainingMs: number;
  paused: boolean;
  pieces: ClearedPiece[];
  maxBurstMinutes: number;
  onPause: () => void;
  onResume: () => void;
  onStop: () => void;
}

/** The running block or rest: a big countdown, what to do, pause and stop. */
export function TimerStep({ step, remainingMs, paused, pieces, maxBurstMinutes, onPause, onResume, onStop }: TimerStepProps) {
  const { colors } = useTheme();
  const resting = step.item === 'rest';
  const progress = Math.min(1, Math.max(0, 1 - remainingMs / step.durationMs));
  return (
    <View style={styles.wrap} testID={`timer-${step.item}`}>
      <AppText variant="label" tone="muted">
        {resting ? 'Rest: put the instrument down' : paused ? 'Paused' : 'Playing'}
      </AppText>
      <AppText variant="title" testID="timer-title">
        {stepTitle(step)}
      </AppText>
      <AppText
        testID="timer-countdown"
        accessibilityLabel={`${clockText(remainingMs)} left`}
        style={[styles.clock, { color: resting ? colors.info : colors.primary, fontFamily: fonts.bold }]}
      >
        {clockText(remainingMs)}
      </AppText>
      <View style={[styles.track, { backgroundColor: colors.surfaceMuted }]} accessibilityRole="progressbar" accessibilityValue={{ min: 0, max: 100, now: Math.round(progress * 100) }}>
        <View style={[styles.fill, { width: `${progress * 100}%`, backgroundColor: resting ? colors.info : colors.primary }]} />
      </View>
      <AppText>{whatToPlay(step, pieces, maxBurstMinutes)}</AppText>
      <View style={styles.actions}>
        {paused ? (
          <Button testID="timer-resume" label="Resume" icon="play" fullWidth onPress={onResume} />
        ) : (
          <Button testID="timer-pause" label="Pause" icon="pause" variant="secondary" fullWidth onPress={onPause} />
        )}
        <Button testID="timer-stop" label="Stop now — it hurts or I am done" icon="hand-left-outline" variant="ghost" fullWidth onPress={onStop} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md, alignItems: 'stretch' },
  clock: { fontSize: 72, lineHeight: 84, textAlign: 'center' },
  track: { height: 10, borderRadius: radii.pill, overflow: 'hidden' },
  fill: { height: 10 },
  actions: { gap: spacing.sm, marginTop: spacing.md },
});
