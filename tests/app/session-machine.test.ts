import {
  clockText,
  currentStep,
  minutesPlayed,
  remainingMs,
  sessionReducer,
  startSession,
  type SessionState,
} from '@/components/today/session-machine';
import { shortSession } from './session-fixtures';

const MIN = 60_000;

function begin(speed = 1): SessionState {
  return sessionReducer(startSession(shortSession, { threshold: 0, speed }), { type: 'answer_gate', pain: 0, redFlags: [], at: 0 });
}

describe('session machine', () => {
  it('starts at the gate before the session and runs the warm-up once it is passed', () => {
    const fresh = startSession(shortSession, { threshold: 0 });
    expect(currentStep(fresh)).toEqual({ kind: 'gate', position: 'before' });
    const running = begin();
    expect(currentStep(running)).toMatchObject({ kind: 'timed', item: 'warm_up' });
    expect(clockText(remainingMs(running, 0))).toBe('01:00');
  });

  it('advances from warm-up to block 1 and stops at the gate between blocks when the time is up', () => {
    let s = begin();
    s = sessionReducer(s, { type: 'tick', at: 30_000 });
    expect(clockText(remainingMs(s, 30_000))).toBe('00:30');
    s = sessionReducer(s, { type: 'tick', at: MIN + 1 });
    expect(currentStep(s)).toMatchObject({ kind: 'timed', item: 'play', block: 1 });
    // A long gap (a sleeping tab) carries time over but never runs past a gate.
    s = sessionReducer(s, { type: 'tick', at: 10 * MIN });
    expect(currentStep(s)).toEqual({ kind: 'gate', position: 'between', afterBlock: 1 });
    expect(minutesPlayed(s, 10 * MIN)).toBe(2);
  });

  it('does not count time while paused', () => {
    let s = begin();
    s = sessionReducer(s, { type: 'pause', at: 20_000 });
    expect(s.status).toBe('paused');
    s = sessionReducer(s, { type: 'tick', at: 5 * MIN });
    expect(remainingMs(s, 5 * MIN)).toBe(40_000);
    s = sessionReducer(s, { type: 'resume', at: 5 * MIN });
    s = sessionReducer(s, { type: 'tick', at: 5 * MIN + 40_001 });
    expect(currentStep(s)).toMatchObject({ item: 'play', block: 1 });
  });

  it('multiplies the clock by the speed', () => {
    let s = begin(60);
    s = sessionReducer(s, { type: 'tick', at: 1_001 });
    expect(currentStep(s)).toMatchObject({ item: 'play', block: 1 });
  });

  it('ends the session at once when a gate goes over the threshold (pain means stop)', () => {
    let s = sessionReducer(begin(), { type: 'tick', at: 3 * MIN + 1 });
    s = sessionReducer(s, { type: 'answer_gate', pain: 1, redFlags: [], at: 3 * MIN + 2 });
    expect(s).toMatchObject({ status: 'stopped', stopReason: 'pain' });
    expect(s.gates).toEqual([{ position: 'before', pain: 0 }, { position: 'between', afterBlock: 1, pain: 1 }]);
    expect(sessionReducer(s, { type: 'tick', at: 9 * MIN })).toBe(s);
  });

  it('stops on a red flag even with no pain', () => {
    const s = sessionReducer(startSession(shortSession, { threshold: 3 }), { type: 'answer_gate', pain: 0, redFlags: ['tingling'], at: 0 });
    expect(s).toMatchObject({ status: 'stopped', stopReason: 'red_flag', redFlags: ['tingling'] });
  });

  it('runs through rest, block 2, the gate after and cool-down to the end, counting only blocks as played', () => {
    let s = sessionReducer(begin(), { type: 'tick', at: 3 * MIN });
    s = sessionReducer(s, { type: 'answer_gate', pain: 0, redFlags: [], at: 3 * MIN });
    expect(currentStep(s)).toMatchObject({ item: 'rest' });
    s = sessionReducer(s, { type: 'tick', at: 6 * MIN });
    expect(currentStep(s)).toEqual({ kind: 'gate', position: 'after', afterBlock: 2 });
    s = sessionReducer(s, { type: 'answer_gate', pain: 0, redFlags: [], at: 6 * MIN });
    s = sessionReducer(s, { type: 'tick', at: 7 * MIN });
    expect(s.status).toBe('finished');
    expect(minutesPlayed(s, 7 * MIN)).toBe(4);
  });

  it('goes straight to the gate after the session when stopped early, counting the part played', () => {
    let s = sessionReducer(begin(), { type: 'tick', at: 2 * MIN });
    s = sessionReducer(s, { type: 'end_early', at: 2 * MIN });
    expect(currentStep(s)).toEqual({ kind: 'gate', position: 'after', afterBlock: 1 });
    expect(minutesPlayed(s, 2 * MIN)).toBe(1);
  });
});
