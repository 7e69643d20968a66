import type { PlanFormField } from './plan-form';

export interface FieldSpec {
  name: PlanFormField;
  label: string;
  hint?: string;
  kind?: 'number' | 'text';
}

export interface GroupSpec {
  key: string;
  title: string;
  description: string;
  fields: FieldSpec[];
  /** Issues about the group as a whole (e.g. tiers out of order). */
  groupError?: 'tierUnlockStage' | 'painThreshold';
}

/** Every plan setting, grouped the way a clinician thinks about them. */
export const FIELD_GROUPS: GroupSpec[] = [
  {
    key: 'dates',
    title: 'Dates and event',
    description: 'Dates as YYYY-MM-DD, in the plan’s time zone.',
    fields: [
      { name: 'startDate', label: 'Start date', kind: 'text' },
      { name: 'event.name', label: 'Event', hint: 'For example: spring showcase.', kind: 'text' },
      { name: 'event.date', label: 'Event date', kind: 'text' },
      { name: 'timeZone', label: 'Time zone', hint: 'For example: Europe/London.', kind: 'text' },
    ],
  },
  {
    key: 'minutes',
    title: 'Minutes and sessions',
    description: 'Playing minutes a day now and at the event; sessions split the day.',
    fields: [
      { name: 'startMinutesPerDay', label: 'Tolerated now (min a day)' },
      { name: 'targetMinutesPerDay', label: 'Target for the event (min a day)' },
      { name: 'maxSessionsPerDay', label: 'Most sessions a day' },
      { name: 'maxSessionMinutes', label: 'Longest session (min)' },
      { name: 'sessionTimes', label: 'Session start times', hint: 'In order, separated by commas: 10:00, 14:00.', kind: 'text' },
    ],
  },
  {
    key: 'blocks',
    title: 'Blocks and rests',
    description: 'Rest at least 1 minute for every 5 played; blocks lengthen from the start to the target.',
    fields: [
      { name: 'startBlockMinutes', label: 'Block now (min)' },
      { name: 'startRestMinutes', label: 'Rest now (min)' },
      { name: 'targetBlockMinutes', label: 'Block at the target (min)' },
      { name: 'targetRestMinutes', label: 'Rest at the target (min)' },
      { name: 'warmUpMinutes', label: 'Warm-up (min)' },
      { name: 'coolDownMinutes', label: 'Cool-down (min)' },
    ],
  },
  {
    key: 'progression',
    title: 'Progression rule and caps',
    description: 'Move up only after symptom-free playing days; growth never exceeds the caps.',
    fields: [
      { name: 'minDaysPerStage', label: 'Fewest playing days at a stage' },
      { name: 'maxDaysPerStage', label: 'Most playing days at a stage' },
      { name: 'stepMinutes', label: 'Minutes added per stage' },
      { name: 'maxStageGrowthPercent', label: 'Cap per stage (%)' },
      { name: 'maxWeeklyGrowthPercent', label: 'Cap per week (%)' },
      { name: 'failuresBeforeStepBack', label: 'Failed days before a step back' },
    ],
  },
  {
    key: 'pain',
    title: 'Pain thresholds',
    description: 'Highest pain (0-10) at which a gate still passes. 0 means no pain is accepted.',
    fields: [
      { name: 'painThreshold.session', label: 'During and after a session' },
      { name: 'painThreshold.nextMorning', label: 'The next morning' },
    ],
    groupError: 'painThreshold',
  },
  {
    key: 'tiers',
    title: 'Repertoire tiers',
    description: 'The stage at which each difficulty tier is cleared, and demanding passages after it.',
    fields: [
      { name: 'tierUnlockStage.easy', label: 'Easy pieces from stage' },
      { name: 'tierUnlockStage.moderate', label: 'Moderate pieces from stage' },
      { name: 'tierUnlockStage.demanding', label: 'Demanding pieces from stage' },
      { name: 'passagesUnlockStage', label: 'Demanding passages from stage' },
    ],
    groupError: 'tierUnlockStage',
  },
  {
    key: 'bursts',
    title: 'Bursts of demanding passages',
    description: 'Short bursts interleaved with easy material.',
    fields: [
      { name: 'maxBurstMinutes', label: 'Longest burst (min)' },
      { name: 'easyBetweenBurstsMinutes', label: 'Easy playing between bursts (min)' },
    ],
  },
  {
    key: 'taper',
    title: 'Taper before the event',
    description: 'Lighter days before the event, and the event day itself.',
    fields: [
      { name: 'taperDays', label: 'Lighter days before the event' },
      { name: 'taperPercent', label: 'Playing on those days (% of the target)' },
    ],
  },
];
