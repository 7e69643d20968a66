import { escapeHtml, printablePage } from './html';

export interface PrintablePlan {
  musicianName: string;
  instrument: string;
  clinicianName: string;
  version: number;
  printedOn: string;
  event: { name: string; date: string };
  startDate: string;
  status: string;
  stages: { number: number; startDate: string; endDate: string; minutesPerDay: number; sessionsPerDay: number; blockMinutes: number; restMinutes: number; tier: string; passages: boolean; expected: boolean; source: string }[];
  rules: string[];
  setup: { label: string; instructions: string }[];
  pieces: { title: string; composer: string; tier: string; cleared: boolean; expectedOn: string | null }[];
  cautions: string[];
}

const list = (items: string[]) => `<ul>${items.map((item) => `<li>${escapeHtml(item)}</li>`).join('')}</ul>`;

/** A self-contained, print-friendly page (no scripts, no external files); every text is escaped. */
export function renderPrintablePlan(plan: PrintablePlan): string {
  const e = escapeHtml;
  const stageRows = plan.stages
    .map((s) => `<tr><td>${e(s.number)}</td><td>${e(s.startDate)} to ${e(s.endDate)}${s.expected ? ' (expected)' : ''}</td><td>${e(s.minutesPerDay)}</td><td>${e(s.sessionsPerDay)}</td><td>${e(s.blockMinutes)} min play / ${e(s.restMinutes)} min rest</td><td>${e(s.tier)}${s.passages ? '; demanding passages in short bursts' : ''}</td><td>${e(s.source)}</td></tr>`)
    .join('');
  const pieceRows = plan.pieces
    .map((p) => `<tr><td>${e(p.title)}</td><td>${e(p.composer)}</td><td>${e(p.tier)}</td><td>${p.cleared ? 'Cleared now' : p.expectedOn ? `Expected from ${e(p.expectedOn)}` : 'Not yet scheduled'}</td></tr>`)
    .join('');
  const setup = plan.setup.length
    ? `<ul>${plan.setup.map((s) => `<li><strong>${e(s.label)}</strong>${s.instructions ? `: ${e(s.instructions)}` : ''}</li>`).join('')}</ul>`
    : '<p>No setup changes prescribed.</p>';
  const body = `<h1>Return-to-playing plan</h1>
<p class="muted">${e(plan.musicianName)}, ${e(plan.instrument)}. Prescribed by ${e(plan.clinicianName)}. Version ${e(plan.version)}, printed ${e(plan.printedOn)}.</p>
<p class="muted">Towards ${e(plan.event.name)} on ${e(plan.event.date)}; started ${e(plan.startDate)}; now: ${e(plan.status)}.</p>
<h2>Stages</h2>
<table><thead><tr><th>Stage</th><th>Dates</th><th>Minutes a day</th><th>Sessions</th><th>Blocks and rests</th><th>Repertoire</th><th>Basis</th></tr></thead><tbody>${stageRows}</tbody></table>
<h2>Rules</h2>${list(plan.rules)}
<h2>Playing setup</h2>${setup}
<h2>Repertoire</h2>
${plan.pieces.length ? `<table><thead><tr><th>Piece</th><th>Composer</th><th>Tier</th><th>Clearance</th></tr></thead><tbody>${pieceRows}</tbody></table>` : '<p>No pieces listed.</p>'}
<div class="caution"><h2>Cautions</h2>${list(plan.cautions)}</div>`;
  return printablePage(`Return-to-playing plan: ${plan.musicianName}`, body);
}
