import { sessionItemLine, type DaySession } from '../../shared/scheduler';

export function sessionTitle(session: DaySession, sessionsThatDay: number): string {
  const which = sessionsThatDay > 1 ? ` ${session.index + 1} of ${sessionsThatDay}` : '';
  return `Playing session${which}: ${session.playingMinutes} min`;
}

/** The blocks of a session in plain words, for calendar descriptions and e-mails. */
export function describeSession(session: DaySession, threshold: number): string {
  return [
    ...session.items.map((item) => `${sessionItemLine(item, threshold)}.`),
    '',
    'Pain is a signal to stop, not to push through. Numbness, tingling, weakness or loss of control: stop and contact your clinician.',
  ].join('\n');
}
