import { useEffect, useRef, useState } from 'react';
import { Modal, ScrollView, StyleSheet, View } from 'react-native';
import { maxFormWidth, spacing } from '@/constants/theme';
import { useCheckInQueue } from '@/hooks/use-check-ins';
import { useTheme } from '@/hooks/use-theme';
import { unlockCues } from '@/lib/session-cues';
import type { DaySession, Today } from '@/shared/schemas/today';
import { Button } from '@/components/ui/button';
import { AppText } from '@/components/ui/text';
import { GateStep } from './gate-step';
import { ResumeNotice } from './resume-notice';
import { minutesPlayed, remainingMs, type SessionState } from './session-machine';
import { SessionDone } from './session-done';
import { StopOutcome } from './stop-outcome';
import { TimerStep } from './timer-step';
import { useSessionRun } from './use-session-run';
import { WrapUpStep } from './wrap-up-step';

export interface SessionRunnerProps {
  today: Today;
  session: DaySession;
  /** Clock multiplier: 1 in use; larger in tests and demonstrations. */
  speed?: number;
  now?: () => number;
  onClose: () => void;
  /** A place kept on the device from an earlier visit today: the runner starts there, paused. */
  restored?: SessionState | null;
  /** Called as the session moves (to keep its place) until its check-in is queued. */
  onProgress?: (state: SessionState, at: number) => void;
  /** Called once the session's check-in is queued: the kept place is no longer needed. */
  onSent?: () => void;
  /** Discards the kept place and runs the session from its first check. */
  onStartOver?: () => void;
}

function checkInOf(today: Today, session: DaySession, state: SessionState, minutes: number, effort?: number) {
  return {
    kind: 'session' as const,
    date: today.date,
    sessionIndex: session.index,
    gates: state.gates,
    redFlags: state.redFlags,
    minutesPlayed: minutes,
    ...(effort === undefined ? {} : { effort }),
  };
}

/** A session, full screen: gates, the timer through blocks and rests, and the check-in at the end. */
export function SessionRunner({ today, session, speed = 1, now, onClose, restored, onProgress, onSent, onStartOver }: SessionRunnerProps) {
  const { colors } = useTheme();
  const { state, step, at, actions } = useSessionRun(session, { threshold: today.painThreshold.session, speed, now, initial: restored });
  const { submit, outcome } = useCheckInQueue();
  const [clientKey, setClientKey] = useState<string | null>(null);
  const [leaving, setLeaving] = useState(false);
  const sent = useRef(false);
  const progress = useRef({ onProgress, onSent });
  progress.current = { onProgress, onSent };

  const send = (checkIn: ReturnType<typeof checkInOf>) => {
    sent.current = true;
    setClientKey(submit(checkIn));
    progress.current.onSent?.();
  };

  // A gate over the threshold or a red flag ends the session at once: the check-in goes straight away.
  useEffect(() => {
    if (state.status !== 'stopped' || sent.current) return;
    send(checkInOf(today, session, state, minutesPlayed(state, at)));
  });

  useEffect(() => {
    if (!sent.current) progress.current.onProgress?.(state, at);
  }, [state, at]);

  const saveWrapUp = (effort: number, minutes: number) => {
    if (sent.current) return;
    send(checkInOf(today, session, state, minutes, effort));
  };
  const inProgress = clientKey === null;
  // The notice describes the place as it came back: once the musician resumes or answers, it is stale.
  const justRestored = restored && state.index === restored.index && state.status === restored.status;
  const blocks = session.items.filter((item) => item.kind === 'gate' && item.gate?.position !== 'before').length;

  let body;
  if (state.status === 'stopped' && state.stopReason) body = <StopOutcome reason={state.stopReason} outcome={clientKey ? outcome(clientKey) : undefined} />;
  else if (clientKey) body = <SessionDone outcome={outcome(clientKey)} />;
  else if (state.status === 'finished') body = <WrapUpStep timedMinutes={minutesPlayed(state, at)} onSave={saveWrapUp} />;
  else if (step?.kind === 'gate')
    body = (
      <GateStep
        key={state.index}
        position={step.position}
        afterBlock={step.afterBlock}
        onAnswer={(pain, flags) => {
          unlockCues();
          actions.answerGate(pain, flags);
        }}
      />
    );
  else if (step?.kind === 'timed')
    body = (
      <TimerStep
        step={step}
        remainingMs={remainingMs(state, at)}
        paused={state.status === 'paused'}
        pieces={today.pieces}
        maxBurstMinutes={today.maxBurstMinutes}
        onPause={actions.pause}
        onResume={actions.resume}
        onStop={actions.endEarly}
      />
    );

  return (
    <Modal visible animationType="none" onRequestClose={onClose} testID="session-runner">
      <ScrollView style={{ backgroundColor: colors.background }} contentContainerStyle={styles.scroll}>
        <View style={styles.column}>
          <View style={styles.top}>
            <AppText variant="label" tone="muted" style={styles.flex}>
              {`Session ${session.index + 1} · ${blocks} block${blocks === 1 ? '' : 's'} · ${session.playingMinutes} min playing${speed > 1 ? ` · clock ×${speed}` : ''}`}
            </AppText>
            {inProgress && !leaving ? (
              <Button testID="session-leave" label="Leave" icon="close" variant="ghost" onPress={() => (state.gates.length > 0 ? setLeaving(true) : onClose())} />
            ) : null}
          </View>
          {justRestored && inProgress && onStartOver ? <ResumeNotice restored={restored} onStartOver={onStartOver} /> : null}
          {leaving ? (
            <View style={[styles.confirm, { borderColor: colors.warning, backgroundColor: colors.warningSurface }]} testID="leave-confirm">
              <AppText variant="bodyStrong">Leave this session for now?</AppText>
              <AppText variant="caption">{onProgress ? 'Your place is kept on this device until the end of today; nothing is sent until you finish.' : 'Nothing is sent until you finish.'}</AppText>
              <View style={styles.row}>
                <Button testID="leave-confirm-yes" label="Leave" variant="secondary" onPress={onClose} />
                <Button testID="leave-confirm-no" label="Stay" onPress={() => setLeaving(false)} />
              </View>
            </View>
          ) : null}
          {body}
          {!inProgress ? <Button testID="session-back" label="Back to today" icon="arrow-back" fullWidth variant={state.status === 'stopped' ? 'secondary' : 'primary'} onPress={onClose} /> : null}
        </View>
      </ScrollView>
    </Modal>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1, padding: spacing.lg, paddingBottom: spacing.xxxl },
  column: { width: '100%', maxWidth: maxFormWidth + 120, alignSelf: 'center', gap: spacing.lg },
  top: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  flex: { flex: 1 },
  confirm: { borderWidth: 1, borderRadius: 10, padding: spacing.md, gap: spacing.sm },
  row: { flexDirection: 'row', gap: spacing.sm },
});
