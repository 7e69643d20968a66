import { currentStep, remainingMs, sessionReducer, startSession, type SessionState } from '@/components/today/session-machine';
import { clearProgress, hasProgress, restoreProgress, saveProgress, snapshotOf, type ProgressKey } from '@/components/today/session-progress';
import { memoryStore } from '@/lib/local-store';
import type { DaySession } from '@/shared/schemas/today';
import { shortSession } from './session-fixtures';

const SEC = 1_000;
const key: ProgressKey = { musicianId: 'mu-1', date: '2027-03-01', sessionIndex: 0 };
const options = { threshold: 0, speed: 1 };

/** Gate before passed at t = 0, then the warm-up (60 s) and 30 s of block 1 played by t = 90 s. */
function thirtySecondsIntoBlockOne(): SessionState {
  let s = sessionReducer(startSession(shortSession, options), { type: 'answer_gate', pain: 0, redFlags: [], at: 0 });
  s = sessionReducer(s, { type: 'tick', at: 90 * SEC });
  return s;
}

describe('session progress kept on the device', () => {
  it('brings a block back paused at the time it had reached, and it stays paused as time passes', () => {
    const store = memoryStore();
    const state = thirtySecondsIntoBlockOne();
    expect(currentStep(state)).toMatchObject({ kind: 'timed', item: 'play', block: 1 });
    const snapshot = snapshotOf(key, shortSession, state, 90 * SEC);
    if (!snapshot) throw new Error('a running session gave no snapshot');
    saveProgress(store, snapshot);

    const restored = restoreProgress(store, key, shortSession, options);
    if (!restored) throw new Error('nothing restored');
    expect(restored.savedAt).toBe(90 * SEC);
    expect(restored.state.status).toBe('paused');
    expect(restored.state.runningSince).toBeNull();
    expect(currentStep(restored.state)).toMatchObject({ kind: 'timed', item: 'play', block: 1 });
    expect(restored.state.gates).toEqual([{ position: 'before', pain: 0 }]);
    // An hour later the countdown has not moved: nothing runs until Resume.
    expect(remainingMs(restored.state, 3_600 * SEC)).toBe(90 * SEC);
    const resumed = sessionReducer(restored.state, { type: 'resume', at: 4_000 * SEC });
    expect(remainingMs(resumed, 4_010 * SEC)).toBe(80 * SEC);
  });

  it('brings back the gates answered and waits at the next gate', () => {
    const store = memoryStore();
    let s = thirtySecondsIntoBlockOne();
    s = sessionReducer(s, { type: 'tick', at: 200 * SEC });
    expect(currentStep(s)).toEqual({ kind: 'gate', position: 'between', afterBlock: 1 });
    saveProgress(store, snapshotOf(key, shortSession, s, 200 * SEC)!);

    const restored = restoreProgress(store, key, shortSession, options)!.state;
    expect(restored.status).toBe('running');
    expect(currentStep(restored)).toEqual({ kind: 'gate', position: 'between', afterBlock: 1 });
    expect(restored.playedMs).toBe(120 * SEC);
    const next = sessionReducer(restored, { type: 'answer_gate', pain: 0, redFlags: [], at: 300 * SEC });
    expect(next.gates).toEqual([{ position: 'before', pain: 0 }, { position: 'between', afterBlock: 1, pain: 0 }]);
    expect(currentStep(next)).toMatchObject({ kind: 'timed', item: 'rest' });
  });

  it('restores nothing for another musician or another session, and drops the musician’s place from an earlier day', () => {
    const store = memoryStore();
    const snapshot = snapshotOf(key, shortSession, thirtySecondsIntoBlockOne(), 90 * SEC)!;
    saveProgress(store, snapshot);
    saveProgress(store, { ...snapshot, musicianId: 'mu-2' });

    expect(restoreProgress(store, { ...key, musicianId: 'mu-3' }, shortSession, options)).toBeNull();
    expect(restoreProgress(store, { ...key, sessionIndex: 1 }, { ...shortSession, index: 1 }, options)).toBeNull();
    // The next day: yesterday's place is not offered, and it is gone for good.
    expect(restoreProgress(store, { ...key, date: '2027-03-02' }, shortSession, options)).toBeNull();
    expect(restoreProgress(store, key, shortSession, options)).toBeNull();
    // Another musician's place on the same device is left alone.
    expect(restoreProgress(store, { ...key, musicianId: 'mu-2' }, shortSession, options)?.state.status).toBe('paused');
  });

  it('restores nothing when the plan has changed the session since', () => {
    const store = memoryStore();
    saveProgress(store, snapshotOf(key, shortSession, thirtySecondsIntoBlockOne(), 90 * SEC)!);
    const longer: DaySession = { ...shortSession, items: shortSession.items.map((item) => (item.kind === 'play' ? { ...item, minutes: 3 } : item)) };
    expect(restoreProgress(store, key, longer, options)).toBeNull();
  });

  it('says a session can be continued only while its place is kept for that day and the plan is unchanged', () => {
    const store = memoryStore();
    expect(hasProgress(store, key, shortSession)).toBe(false);
    saveProgress(store, snapshotOf(key, shortSession, thirtySecondsIntoBlockOne(), 90 * SEC)!);
    expect(hasProgress(store, key, shortSession)).toBe(true);
    expect(hasProgress(store, { ...key, sessionIndex: 1 }, shortSession)).toBe(false);
    expect(hasProgress(store, { ...key, date: '2027-03-02' }, shortSession)).toBe(false);
    const longer: DaySession = { ...shortSession, items: shortSession.items.map((item) => (item.kind === 'play' ? { ...item, minutes: 3 } : item)) };
    expect(hasProgress(store, key, longer)).toBe(false);
    clearProgress(store, key);
    expect(hasProgress(store, key, shortSession)).toBe(false);
  });

  it('keeps nothing before the first check or once the session has stopped, and clearing removes only that session', () => {
    const store = memoryStore();
    expect(snapshotOf(key, shortSession, startSession(shortSession, options), 0)).toBeNull();
    const stopped = sessionReducer(startSession(shortSession, options), { type: 'answer_gate', pain: 0, redFlags: ['numbness'], at: 0 });
    expect(stopped.status).toBe('stopped');
    expect(snapshotOf(key, shortSession, stopped, 0)).toBeNull();

    const snapshot = snapshotOf(key, shortSession, thirtySecondsIntoBlockOne(), 90 * SEC)!;
    saveProgress(store, snapshot);
    saveProgress(store, { ...snapshot, sessionIndex: 1 });
    clearProgress(store, key);
    expect(restoreProgress(store, key, shortSession, options)).toBeNull();
    expect(restoreProgress(store, { ...key, sessionIndex: 1 }, shortSession, options)).not.toBeNull();
  });

  it('ignores damaged storage instead of failing, and keeps the good entries beside a bad one', () => {
    const store = memoryStore();
    store.write('ritorno.session-progress.v1', '{not json');
    expect(restoreProgress(store, key, shortSession, options)).toBeNull();

    const good = snapshotOf(key, shortSession, thirtySecondsIntoBlockOne(), 90 * SEC)!;
    store.write('ritorno.session-progress.v1', JSON.stringify([{ ...good, sessionIndex: 'first' }, good]));
    expect(restoreProgress(store, key, shortSession, options)?.state.status).toBe('paused');
  });
});
