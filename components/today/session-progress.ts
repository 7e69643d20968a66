import { z } from 'zod';
import { deviceStore, type KeyValueStore } from '@/lib/local-store';
import { GateAnswerSchema, GatePositionSchema, RedFlagSchema } from '@/shared/schemas/check-in';
import { TierSchema } from '@/shared/schemas/piece';
import type { DaySession } from '@/shared/schemas/today';
import { currentStep, elapsedAt, stepsOf, type SessionState } from './session-machine';

/**
 * A session in progress kept on the device, so a reload or a closed tab does not lose its place: which
 * step, the gates answered, the warning signs given, and how far into a block the timer was. It comes
 * back paused (never running on by itself), only for the same musician, day and session, and is dropped
 * once the session's check-in is queued or the day has moved on.
 */
const STORE_KEY = 'ritorno.session-progress.v1';

let deviceProgress: KeyValueStore | null = null;
/** The device's storage, opened once (screens take another store in tests). */
export const progressStore = (): KeyValueStore => (deviceProgress ??= deviceStore());

export interface ProgressKey {
  musicianId: string;
  date: string;
  sessionIndex: number;
}

const StepSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('gate'), position: GatePositionSchema, afterBlock: z.number().int().min(1).optional() }),
  z.object({
    kind: z.literal('timed'),
    item: z.enum(['warm_up', 'play', 'burst', 'rest', 'cool_down']),
    durationMs: z.number().int().min(0),
    block: z.number().int().optional(),
    tier: TierSchema.nullable().optional(),
  }),
]);

const SavedSchema = z.object({
  musicianId: z.string(),
  date: z.string(),
  sessionIndex: z.number().int().min(0),
  /** The session as planned when it was saved: a changed plan makes the saved place meaningless. */
  planned: z.string(),
  /** Real time of the last save (ms), for "paused at" wording. */
  savedAt: z.number(),
  steps: z.array(StepSchema),
  index: z.number().int().min(0),
  finished: z.boolean(),
  elapsedMs: z.number().min(0),
  playedMs: z.number().min(0),
  gates: z.array(GateAnswerSchema),
  redFlags: z.array(RedFlagSchema),
});
export type SavedProgress = z.infer<typeof SavedSchema>;

function sameKey(a: ProgressKey, b: ProgressKey): boolean {
  return a.musicianId === b.musicianId && a.date === b.date && a.sessionIndex === b.sessionIndex;
}

function readAll(store: KeyValueStore): SavedProgress[] {
  let raw: unknown;
  try {
    raw = JSON.parse(store.read(STORE_KEY) ?? '[]');
  } catch {
    return [];
  }
  if (!Array.isArray(raw)) return [];
  // One damaged entry must not take the others with it.
  return raw.flatMap((entry) => {
    const parsed = SavedSchema.safeParse(entry);
    return parsed.success ? [parsed.data] : [];
  });
}

function writeAll(store: KeyValueStore, entries: SavedProgress[]): void {
  store.write(STORE_KEY, JSON.stringify(entries));
}

const plannedOf = (session: DaySession) => JSON.stringify(stepsOf(session));

/**
 * What to keep of `state` at real time `at`; null before the first check is answered (nothing to come
 * back to) and once the session has stopped (its check-in is due).
 */
export function snapshotOf(key: ProgressKey, session: DaySession, state: SessionState, at: number): SavedProgress | null {
  if (state.status === 'stopped' || state.gates.length === 0) return null;
  const finished = state.status === 'finished';
  return {
    ...key,
    planned: plannedOf(session),
    savedAt: at,
    steps: state.steps,
    index: state.index,
    finished,
    elapsedMs: finished || currentStep(state)?.kind !== 'timed' ? 0 : elapsedAt(state, at),
    playedMs: state.playedMs,
    gates: state.gates,
    redFlags: state.redFlags,
  };
}

/** Keeps the snapshot, replacing any earlier one for the same musician, day and session. */
export function saveProgress(store: KeyValueStore, snapshot: SavedProgress): void {
  writeAll(store, [...readAll(store).filter((entry) => !sameKey(entry, snapshot)), snapshot]);
}

export function clearProgress(store: KeyValueStore, key: ProgressKey): void {
  const entries = readAll(store);
  const kept = entries.filter((entry) => !sameKey(entry, key));
  if (kept.length !== entries.length) writeAll(store, kept);
}

/** Whether a place is kept for this session today (and the plan has not changed it since); reads only. */
export function hasProgress(store: KeyValueStore, key: ProgressKey, session: DaySession): boolean {
  const saved = readAll(store).find((entry) => sameKey(entry, key));
  return saved !== undefined && saved.planned === plannedOf(session);
}

/**
 * The saved place for this musician's session today, as a state to run from, or null. Drops the
 * musician's entries from other days on the way. A timed step comes back paused at its elapsed time.
 */
export function restoreProgress(
  store: KeyValueStore,
  key: ProgressKey,
  session: DaySession,
  options: { threshold: number; speed: number },
): { state: SessionState; savedAt: number } | null {
  const entries = readAll(store);
  const current = entries.filter((entry) => entry.musicianId !== key.musicianId || entry.date === key.date);
  if (current.length !== entries.length) writeAll(store, current);
  const saved = current.find((entry) => sameKey(entry, key));
  if (!saved || saved.planned !== plannedOf(session) || saved.index > saved.steps.length) return null;
  const step = saved.steps[saved.index];
  const finished = saved.finished || !step;
  const state: SessionState = {
    steps: saved.steps,
    index: saved.index,
    status: finished ? 'finished' : step.kind === 'timed' ? 'paused' : 'running',
    speed: Math.max(1, options.speed),
    threshold: options.threshold,
    runningSince: null,
    elapsedMs: finished || step.kind !== 'timed' ? 0 : Math.min(saved.elapsedMs, step.durationMs),
    playedMs: saved.playedMs,
    gates: saved.gates,
    redFlags: saved.redFlags,
    stopReason: null,
  };
  return { state, savedAt: saved.savedAt };
}
