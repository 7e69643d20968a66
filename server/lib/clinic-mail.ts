import { spokenDate } from '../../shared/scheduler';
import type { CaseloadEntry } from '../../shared/schemas/musician';
import type { OutgoingMail } from './mailer';

const CAUTION =
  'Ritorno supports, and never replaces, your clinician. Pain is a signal to stop, not to push through. ' +
  'Numbness, tingling, weakness, night pain, swelling or loss of control: stop playing and contact your clinician promptly.';

/** To the musician when a plan version becomes active. No clinical detail beyond the plan itself. */
export function planActivatedMail(input: {
  to: string;
  musicianName: string;
  clinicianName: string;
  version: number;
  startDate: string;
  event: { name: string; date: string };
  firstStage: { minutesPerDay: number; blockMinutes: number; restMinutes: number } | null;
  link: string;
}): OutgoingMail {
  const first = input.firstStage;
  return {
    to: input.to,
    subject: `Your return-to-playing plan is ready (version ${input.version})`,
    text: [
      `Hello ${input.musicianName},`,
      '',
      `${input.clinicianName} has activated version ${input.version} of your plan towards ${input.event.name} on ${spokenDate(input.event.date)}.`,
      first
        ? `It starts on ${spokenDate(input.startDate)} with ${first.minutesPerDay} minutes of playing a day, in blocks of at most ${first.blockMinutes} minutes with ${first.restMinutes} minutes of rest between them.`
        : `It starts on ${spokenDate(input.startDate)}.`,
      'Each day Ritorno shows your sessions, the pain checks and what you may play.',
      '',
      `Open your plan: ${input.link}`,
      '',
      CAUTION,
    ].join('\n'),
  };
}

function line(entry: CaseloadEntry): string {
  const plan = entry.plan;
  const where = plan
    ? `stage ${plan.stageNumber} of ${plan.stageCount}, ${plan.status.replace('_', ' ')}, ${plan.daysToEvent} days to ${plan.event.name}`
    : entry.joined ? 'no active plan' : 'invitation not yet accepted';
  const last = entry.lastCheckInDate ? `last check-in ${spokenDate(entry.lastCheckInDate)}` : 'no check-ins yet';
  const alerts = entry.alerts.map((alert) => `    ${alert.severity === 'urgent' ? 'URGENT' : 'Note'}: ${alert.message}`);
  return [`- ${entry.name} (${entry.instrument}): ${where}; ${last}.`, ...alerts].join('\n');
}

/** The weekly caseload summary to a clinician; musicians needing attention come first. */
export function weeklySummaryMail(input: { to: string; clinicianName: string; week: string; entries: CaseloadEntry[]; link: string }): OutgoingMail {
  const attention = input.entries.filter((entry) => entry.alerts.length > 0).length;
  return {
    to: input.to,
    subject: `Ritorno weekly summary ${input.week}: ${attention} of ${input.entries.length} need attention`,
    text: [
      `Hello ${input.clinicianName},`,
      '',
      `Your caseload this week (${input.week}):`,
      '',
      ...input.entries.map(line),
      '',
      `Open the caseload: ${input.link}`,
      '',
      'Load ratios are sport-derived prompts, not verdicts; the plan and every decision stay yours.',
    ].join('\n'),
  };
}
