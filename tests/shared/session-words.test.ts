import { sessionItemLine, tierAllowance } from '@/shared/scheduler';

// One wording of a session's items for the Today screen and the calendar (server/services/session-words.ts).
describe('session items in words', () => {
  it('says the stop threshold at every gate that can stop the session', () => {
    expect(sessionItemLine({ kind: 'gate', minutes: 0, gate: { position: 'before' } }, 0)).toBe('Pain check before you start: stop if pain is above 0');
    expect(sessionItemLine({ kind: 'gate', minutes: 0, gate: { position: 'between', afterBlock: 2 } }, 3)).toBe('Quick pain check after block 2: stop if pain is above 3');
  });

  it('names what a block may be played on, from exercises to the tier allowed', () => {
    expect(sessionItemLine({ kind: 'play', minutes: 5, block: 1, tier: 'easy' }, 0)).toBe('Block 1: 5 min of easy pieces');
    expect(sessionItemLine({ kind: 'play', minutes: 25, block: 3, tier: 'demanding' }, 0)).toBe('Block 3: 25 min of pieces up to demanding');
    expect(tierAllowance(null)).toBe('technical exercises only');
    expect(sessionItemLine({ kind: 'burst', minutes: 2 }, 0)).toBe('Demanding passage, at most 2 min');
    expect(sessionItemLine({ kind: 'rest', minutes: 60 }, 0)).toBe('Rest, 60 min, instrument down');
  });
});
