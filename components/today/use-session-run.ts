import { useEffect, useReducer, useRef, useState } from 'react';
import { playCue } from '@/lib/session-cues';
import type { DaySession } from '@/shared/schemas/today';
import type { RedFlag } from '@/shared/schemas/check-in';
import { currentStep, sessionReducer, startSession, type SessionState } from './session-machine';

export interface SessionRunOptions {
  threshold: number;
  speed: number;
  /** The clock, injectable for tests. */
  now?: () => number;
  tickMs?: number;
  /** A saved place to run from instead of the session's start (restored paused). */
  initial?: SessionState | null;
}

/** Runs the session machine against a clock: ticks while a timed step runs, and cues each change. */
export function useSessionRun(session: DaySession, { threshold, speed, now = Date.now, tickMs = 250, initial }: SessionRunOptions) {
  const [state, dispatch] = useReducer(sessionReducer, session, (s) => initial ?? startSession(s, { threshold, speed }));
  const [at, setAt] = useState(() => now());
  const step = currentStep(state);
  const ticking = step?.kind === 'timed' && state.status === 'running';
  const clock = useRef(now);
  clock.current = now;

  useEffect(() => {
    if (!ticking) return undefined;
    const id = setInterval(() => {
      const t = clock.current();
      setAt(t);
      dispatch({ type: 'tick', at: t });
    }, tickMs);
    return () => clearInterval(id);
  }, [ticking, tickMs]);

  const lastIndex = useRef(state.index);
  useEffect(() => {
    if (state.index !== lastIndex.current && state.status !== 'stopped') playCue(state.status === 'finished' ? 'done' : 'step');
    lastIndex.current = state.index;
  }, [state.index, state.status]);

  const stamp = () => {
    const t = clock.current();
    setAt(t);
    return t;
  };
  const actions = {
    answerGate: (pain: number, redFlags: RedFlag[]) => dispatch({ type: 'answer_gate', pain, redFlags, at: stamp() }),
    pause: () => dispatch({ type: 'pause', at: stamp() }),
    resume: () => dispatch({ type: 'resume', at: stamp() }),
    endEarly: () => dispatch({ type: 'end_early', at: stamp() }),
  };
  return { state, step, at, actions };
}
