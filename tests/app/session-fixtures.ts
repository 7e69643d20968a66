import type { CheckInResult, DaySession, Today } from '@/shared/schemas/today';
import type { PlanOverview } from '@/shared/schemas/plan-overview';

/** A short invented session: warm-up 1, block 1 of 2 min, rest 1, block 2 of 2 min, cool-down 1. */
export const shortSession: DaySession = {
  index: 0,
  startTime: '10:00',
  startsAt: '2027-03-01T10:00:00.000Z',
  playingMinutes: 4,
  done: false,
  items: [
    { kind: 'gate', minutes: 0, startMinute: 0, gate: { position: 'before' } },
    { kind: 'warm_up', minutes: 1, startMinute: 0 },
    { kind: 'play', minutes: 2, startMinute: 1, block: 1, tier: 'easy' },
    { kind: 'gate', minutes: 0, startMinute: 3, block: 1, gate: { position: 'between', afterBlock: 1 } },
    { kind: 'rest', minutes: 1, startMinute: 3, block: 1 },
    { kind: 'play', minutes: 2, startMinute: 4, block: 2, tier: 'easy' },
    { kind: 'gate', minutes: 0, startMinute: 6, block: 2, gate: { position: 'after', afterBlock: 2 } },
    { kind: 'cool_down', minutes: 1, startMinute: 6 },
  ],
};

export const overview: PlanOverview = {
  planId: 'p-1',
  version: 1,
  today: '2027-03-01',
  status: 'on_track',
  stageNumber: 2,
  stageCount: 8,
  minutesPerDay: 4,
  sessionsPerDay: 1,
  longestBlockMinutes: 2,
  restMinutes: 1,
  highestTier: 'easy',
  nextStageStartDate: '2027-03-04',
  event: { name: 'Spring recital', date: '2027-04-20' },
  daysToEvent: 50,
  feasible: true,
  targetReachedOn: '2027-04-10',
  daysShort: 0,
  redFlagActive: false,
  lastChange: null,
};

export const today: Today = {
  date: '2027-03-01',
  kind: 'playing',
  notes: [],
  overview,
  sessions: [shortSession],
  pieces: [{ id: 'pc-1', title: 'Air on the Quay', composer: 'Mira Tallis', tier: 'easy', passages: [] }],
  setup: [{ id: 'st-1', label: 'Neck strap', instructions: 'Wear it for every block.' }],
  painThreshold: { session: 0, nextMorning: 0 },
  maxBurstMinutes: 2,
  morningCheckFor: null,
};

export function resultOf(partial: Partial<CheckInResult>): CheckInResult {
  return { id: 'ci-1', duplicate: false, overview, stopPlaying: false, redFlag: false, clinicianNotified: false, change: null, ...partial };
}
