import type { PlanSummary } from '../../shared/scheduler';
import type { PlanOverview } from '../../shared/schemas/plan-overview';
import type { plans } from '../db/schema';

/** The engine's summary cut down to what the musician and clinician screens show. */
export function toOverview(plan: Pick<typeof plans.$inferSelect, 'id' | 'version'>, summary: PlanSummary): PlanOverview {
  return {
    planId: plan.id,
    version: plan.version,
    today: summary.today,
    status: summary.status,
    stageNumber: summary.stageNumber,
    stageCount: summary.stageCount,
    minutesPerDay: summary.minutesPerDay,
    sessionsPerDay: summary.sessionsPerDay,
    longestBlockMinutes: summary.longestBlockMinutes,
    restMinutes: summary.restMinutes,
    highestTier: summary.highestTier,
    nextStageStartDate: summary.nextStageStartDate,
    event: summary.event,
    daysToEvent: summary.daysToEvent,
    feasible: summary.feasible,
    targetReachedOn: summary.targetReachedOn,
    daysShort: summary.daysShort,
    redFlagActive: summary.redFlagActive,
    lastChange: summary.lastChange,
  };
}
