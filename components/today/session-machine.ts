import type { GateAnswer, GatePosition, RedFlag } from '@/shared/schemas/check-in';
import type { Tier } from '@/shared/schemas/piece';
import type { DaySession } from '@/shared/schemas/today';

export type TimedKind = 'warm_up' | 'play' | 'burst' | 'rest' | 'cool_down';

/** One step of a running session: a pain gate to answer, or a timed item to play or rest through. */
export type SessionStep =
  | { kind: 'gate'; position: GatePosition; afterBlock?: number }
  | { kind: 'timed'; item: TimedKind; durationMs: number; block?: number; tier?: Tier | null };

export type SessionStatus = 'running' | 'paused' | 'finished' | 'stopped';

export interface SessionState {
  steps: SessionStep[];
  index: number;
  status: SessionStatus;
  /** How many session milliseconds pass per real millisecond (1 in use; more in tests and demos). */
  speed: number;
  threshold: number;
  /** When the current timed step last started running (real ms), null while paused or at a gate. */
  runningSince: number | null;
  /** Session time already spent in the current timed step before `runningSince`. */
  elapsedMs: number;
  /** Playing time (blocks and bursts) of finished steps. */
  playedMs: number;
  gates: GateAnswer[];
  redFlags: RedFlag[];
  stopReason: 'pain' | 'red_flag' | null;
}

export type SessionAction =
  | { type: 'answer_gate'; pain: number; redFlags: RedFlag[]; at: number }
  | { type: 'tick'; at: number }
  | { type: 'pause'; at: number }
  | { type: 'resume'; at: number }
  | { type: 'end_early'; at: number };

const PLAYING: TimedKind[] = ['play', 'burst'];

/** The session's items as steps; zero-length timed items are dropped. */
export function stepsOf(session: DaySession): SessionStep[] {
  return session.items.flatMap((item): SessionStep[] => {
    if (item.kind === 'gate') return item.gate ? [{ kind: 'gate', ...item.gate }] : [];
    if (item.minutes <= 0) return [];
    return [{ kind: 'timed', item: item.kind, durationMs: item.minutes * 60_000, block: item.block, tier: item.tier }];
  });
}

export function startSession(session: DaySession, options: { threshold: number; speed?: number }): SessionState {
  return {
    steps: stepsOf(session),
    index: 0,
    status: 'running',
    speed: Math.max(1, options.speed ?? 1),
    threshold: options.threshold,
    runningSince: null,
    elapsedMs: 0,
    playedMs: 0,
    gates: [],
    redFlags: [],
    stopReason: null,
  };
}

export function currentStep(state: SessionState): SessionStep | undefined {
  return state.steps[state.index];
}

/** Session time spent so far in the current timed step, at real time `at`. */
export function elapsedAt(state: SessionState, at: number): number {
  return state.elapsedMs + (state.runningSince === null ? 0 : Math.max(0, at - state.runningSince) * state.speed);
}

/** Moves past finished timed steps, carrying over time, until a gate, an unfinished step or the end. */
function settle(state: SessionState, at: number): SessionState {
  let s = state;
  for (;;) {
    const step = currentStep(s);
    if (!step) return { ...s, status: 'finished', runningSince: null, elapsedMs: 0 };
    if (step.kind === 'gate') return { ...s, runningSince: null, elapsedMs: 0 };
    if (s.status === 'paused') return s;
    const runningSince = s.runningSince ?? at;
    const elapsed = s.elapsedMs + Math.max(0, at - runningSince) * s.speed;
    if (elapsed < step.durationMs) return { ...s, runningSince };
    s = {
      ...s,
      index: s.index + 1,
      playedMs: s.playedMs + (PLAYING.includes(step.item) ? step.durationMs : 0),
      elapsedMs: elapsed - step.durationMs,
      runningSince: at,
    };
    // Carried-over time may not run past a gate: the musician answers it before anything else starts.
    if (currentStep(s)?.kind === 'gate') s = { ...s, elapsedMs: 0 };
  }
}

/**
 * The session as a pure state machine with injected time: a gate over the pain threshold or any
 * red-flag answer ends it at once ("pain is a signal to stop"); otherwise gates and timed steps follow
 * in the engine's order.
 */
export function sessionReducer(state: SessionState, action: SessionAction): SessionState {
  if (state.status === 'finished' || state.status === 'stopped') return state;
  const step = currentStep(state);
  switch (action.type) {
    case 'answer_gate': {
      if (step?.kind !== 'gate') return state;
      const gate: GateAnswer = { position: step.position, pain: action.pain, ...(step.afterBlock ? { afterBlock: step.afterBlock } : {}) };
      const redFlags = [...new Set([...state.redFlags, ...action.redFlags])];
      const next = { ...state, gates: [...state.gates, gate], redFlags };
      if (action.redFlags.length > 0) return { ...next, status: 'stopped', stopReason: 'red_flag' };
      if (action.pain > state.threshold) return { ...next, status: 'stopped', stopReason: 'pain' };
      return settle({ ...next, index: state.index + 1, status: 'running', runningSince: action.at, elapsedMs: 0 }, action.at);
    }
    case 'tick':
      return step?.kind === 'timed' ? settle(state, action.at) : state;
    case 'pause': {
      if (step?.kind !== 'timed' || state.status !== 'running') return state;
      const settled = settle(state, action.at);
      if (settled.index !== state.index) return settled;
      return { ...settled, status: 'paused', elapsedMs: elapsedAt(settled, action.at), runningSince: null };
    }
    case 'resume':
      return state.status === 'paused' ? { ...state, status: 'running', runningSince: action.at } : state;
    case 'end_early': {
      // Stopping early goes straight to the gate after the session, counting what was played.
      const after = state.steps.findIndex((s) => s.kind === 'gate' && s.position === 'after');
      if (after >= 0 && after < state.index) return { ...state, status: 'finished', runningSince: null, elapsedMs: 0 };
      const played = step?.kind === 'timed' && PLAYING.includes(step.item) ? Math.min(step.durationMs, elapsedAt(state, action.at)) : 0;
      const lastBlock = step?.kind === 'timed' ? step.block : step?.afterBlock;
      const steps: SessionStep[] = [...state.steps.slice(0, state.index), { kind: 'gate', position: 'after', ...(lastBlock ? { afterBlock: lastBlock } : {}) }];
      return { ...state, steps, status: 'running', playedMs: state.playedMs + played, runningSince: null, elapsedMs: 0 };
    }
    default:
      return state;
  }
}

/** Milliseconds left in the current timed step (0 at a gate or the end). */
export function remainingMs(state: SessionState, at: number): number {
  const step = currentStep(state);
  if (step?.kind !== 'timed') return 0;
  return Math.max(0, step.durationMs - elapsedAt(state, at));
}

/** Whole minutes played so far (blocks and bursts only; warm-up, rests and cool-down do not count). */
export function minutesPlayed(state: SessionState, at: number): number {
  const step = currentStep(state);
  const running = step?.kind === 'timed' && PLAYING.includes(step.item) ? Math.min(step.durationMs, elapsedAt(state, at)) : 0;
  return Math.round((state.playedMs + running) / 60_000);
}

/** "04:59" for a countdown, rounding up so it reaches 00:00 only when the step is over. */
export function clockText(ms: number): string {
  const total = Math.ceil(ms / 1000);
  const m = Math.floor(total / 60);
  const s = total % 60;
  return `${String(m).padStart(2, '0')}:${String(s).padStart(2, '0')}`;
}
