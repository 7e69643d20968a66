import { and, eq } from 'drizzle-orm';
import { buildLadder, planSummary, progressionState } from '../../shared/scheduler';
import type { PlanSettings } from '../../shared/schemas/plan-settings';
import type { Db } from '../db/client';
import { setupItems, user } from '../db/schema';
import { renderPrintablePlan } from '../lib/print-html';
import { activePlanOf } from './chart.service';
import { ownMusician } from './own-musician';

export const CAUTIONS = [
  'This plan supports, and never replaces, the judgement of the licensed clinician who prescribed it.',
  'Pain is a signal to stop, not to push through.',
  'Numbness, tingling, weakness, loss of control, night pain or swelling are red flags: stop playing and seek prompt clinical review.',
  'Follow local regulations and professional practice; contact your clinician with any question about this plan.',
];

const STATUS_WORDS = { on_track: 'on track', held: 'held', stepped_back: 'stepped back', stopped: 'stopped until reviewed', complete: 'at the final stage' } as const;

function rulesOf(s: PlanSettings): string[] {
  const pain = (n: number) => (n === 0 ? 'any pain' : `pain above ${n} out of 10`);
  return [
    `Check pain before you start, after each block and after the session. Stop playing at once on ${pain(s.painThreshold.session)}.`,
    s.requireNextMorningCheck
      ? `The next morning, record how you feel. A day counts only if the next morning is free of ${pain(s.painThreshold.nextMorning)}.`
      : 'Record any pain that appears later in the day or the next morning.',
    `Move up a stage only after ${s.minDaysPerStage} playing days without symptoms at the current one.`,
    s.failuresBeforeStepBack === 1
      ? 'When pain stops a session, progression holds; on symptoms, go back one stage until you can progress again.'
      : `When pain stops a session, progression holds; after ${s.failuresBeforeStepBack} such days at a stage, go back one stage.`,
    'Keep to the timings even when you feel fine: symptoms may come later or the next day. Use a timer.',
    `Rest days: ${s.restDaysPerWeek} a week. Before the event: ${s.taperDays} lighter day${s.taperDays === 1 ? '' : 's'} at ${s.taperPercent}% of the planned minutes.`,
  ];
}

/** The active plan as a printable page for the musician's folder (stages as now expected). */
export function printablePlan(db: Db, clinicianId: string, musicianId: string, now: Date): string {
  const musician = ownMusician(db, clinicianId, musicianId);
  const loaded = activePlanOf(db, clinicianId, musicianId);
  const { settings } = loaded;
  const state = progressionState({ ...loaded, today: now });
  const summary = planSummary({ ...loaded, today: now });
  const ladder = buildLadder(settings);
  const clinician = db.select({ name: user.name }).from(user).where(eq(user.id, musician.clinicianId)).get();
  const setup = db
    .select({ label: setupItems.label, instructions: setupItems.instructions })
    .from(setupItems)
    .where(and(eq(setupItems.musicianId, musicianId), eq(setupItems.active, true)))
    .all();
  return renderPrintablePlan({
    musicianName: musician.name,
    instrument: musician.instrument,
    clinicianName: clinician?.name ?? '',
    version: loaded.plan.version,
    printedOn: state.today,
    event: settings.event,
    startDate: settings.startDate,
    status: STATUS_WORDS[state.status],
    stages: state.periods.flatMap((p) => {
      const level = ladder[p.stageIndex];
      if (!level) return [];
      return [{
        number: level.number, startDate: p.startDate, endDate: p.endDate, minutesPerDay: level.minutesPerDay,
        sessionsPerDay: level.sessionsPerDay, blockMinutes: level.blockMinutes, restMinutes: level.restMinutes,
        tier: level.highestTier ? `up to ${level.highestTier}` : 'simple exercises only', passages: level.passagesCleared,
        expected: p.kind === 'projected', source: level.source,
      }];
    }),
    rules: rulesOf(settings),
    setup,
    pieces: summary.repertoire.map((r) => ({ title: r.piece.title, composer: r.piece.composer, tier: r.piece.tier, cleared: r.cleared, expectedOn: r.expectedOn })),
    cautions: CAUTIONS,
  });
}
