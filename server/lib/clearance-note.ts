import type { StudentClearance } from '../../shared/schemas/clearance';
import { spokenDate } from '../../shared/scheduler';
import { escapeHtml as e, printablePage } from './html';

const TIER_WORDS = { easy: 'Easy', moderate: 'Moderate', demanding: 'Demanding' } as const;
const READINESS_WORDS = { on_track: 'On track', delayed: 'Delayed', paused: 'Paused: no playing for now' } as const;

/** The teacher's printable note: limits and repertoire as of a date, with no medical detail. */
export function clearanceNoteHtml(view: StudentClearance): string {
  const cleared = view.pieces.filter((piece) => piece.cleared);
  const waiting = view.pieces.filter((piece) => !piece.cleared);
  const passageText = (piece: StudentClearance['pieces'][number]) =>
    piece.passages
      .map((p) => `${e(p.bars)}: ${p.cleared ? 'cleared' : p.expectedOn ? `expected ${e(spokenDate(p.expectedOn))}` : 'not yet'}`)
      .join('<br>') || '<span class="muted">none marked</span>';
  const row = (piece: StudentClearance['pieces'][number], last: string) =>
    `<tr><td>${e(piece.title)}${piece.composer ? ` <span class="muted">(${e(piece.composer)})</span>` : ''}</td><td>${TIER_WORDS[piece.tier]}</td><td>${last}</td></tr>`;
  const body = [
    `<h1>Playing clearance: ${e(view.name)}</h1>`,
    `<p class="muted">${e(view.instrument)} · as of ${e(spokenDate(view.asOf))} · ${READINESS_WORDS[view.readiness]}</p>`,
    view.event ? `<p>Preparing for <strong>${e(view.event.name)}</strong> on ${e(spokenDate(view.event.date))}.</p>` : '',
    '<h2>Limits for lessons and rehearsals</h2>',
    `<table><tr><th>Longest continuous playing</th><td>${view.limits.longestBlockMinutes} min, then a break of ${view.limits.restMinutes} min</td></tr>`,
    `<tr><th>Most playing in a day</th><td>${view.limits.minutesPerDay} min</td></tr></table>`,
    '<h2>Cleared now</h2>',
    cleared.length
      ? `<table><tr><th>Piece</th><th>Tier</th><th>Demanding passages</th></tr>${cleared.map((p) => row(p, passageText(p))).join('')}</table>`
      : '<p>Nothing is cleared at the moment.</p>',
    '<h2>Not yet cleared</h2>',
    waiting.length
      ? `<table><tr><th>Piece</th><th>Tier</th><th>Expected</th></tr>${waiting.map((p) => row(p, p.expectedOn ? e(spokenDate(p.expectedOn)) : 'not yet known')).join('')}</table>`
      : '<p>Every piece on the list is cleared.</p>',
    '<p class="caution">These limits are set by the musician’s clinician and may change at any time. Expected dates are projections, not promises. If playing becomes uncomfortable, the musician stops and rests.</p>',
  ].join('\n');
  return printablePage(`Playing clearance: ${view.name}`, body);
}
