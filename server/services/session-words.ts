import type { DaySession, SessionItem } from '../../shared/scheduler';

const TIER_WORDS = { easy: 'easy pieces', moderate: 'pieces up to moderate', demanding: 'any cleared piece' } as const;

function itemLine(item: SessionItem, threshold: number): string {
  const tier = item.tier ? ` (${TIER_WORDS[item.tier]})` : '';
  switch (item.kind) {
    case 'gate':
      if (item.gate?.position === 'before') return `Pain check before you start: stop if pain is above ${threshold}.`;
      if (item.gate?.position === 'after') return 'Pain check after playing, and note your effort and minutes.';
      return `Pain check after block ${item.gate?.afterBlock ?? ''}: stop if pain is above ${threshold}.`;
    case 'warm_up':
      return `Warm-up, ${item.minutes} min.`;
    case 'play':
      return `Play ${item.minutes} min${tier}.`;
    case 'burst':
      return `Demanding passage, at most ${item.minutes} min.`;
    case 'rest':
      return `Rest ${item.minutes} min, instrument down.`;
    case 'cool_down':
      return `Cool-down, ${item.minutes} min.`;
  }
}

export function sessionTitle(session: DaySession, sessionsThatDay: number): string {
  const which = sessionsThatDay > 1 ? ` ${session.index + 1} of ${sessionsThatDay}` : '';
  return `Playing session${which}: ${session.playingMinutes} min`;
}

/** The blocks of a session in plain words, for calendar descriptions and e-mails. */
export function describeSession(session: DaySession, threshold: number): string {
  return [
    ...session.items.map((item) => itemLine(item, threshold)),
    '',
    'Pain is a signal to stop, not to push through. Numbness, tingling, weakness or loss of control: stop and contact your clinician.',
  ].join('\n');
}
