import type { GateAnswer, RedFlag } from '../schemas/check-in';

export type ProgressionStatus = 'on_track' | 'held' | 'stepped_back' | 'stopped' | 'complete';

export type HistoryKind =
  | 'advanced'
  | 'held'
  | 'stepped_back'
  | 'stopped'
  | 'red_flag_cleared'
  | 'clinician_hold'
  | 'clinician_resume'
  | 'clinician_advance'
  | 'clinician_step_back'
  | 'over_time'
  | 'short_day';

/** One explained change, e.g. "Stepped back to stage 2 on 12 May 2025: pain 4 after block 2." */
export type HistoryEvent = {
  date: string;
  kind: HistoryKind;
  fromStage: number;
  toStage: number;
  message: string;
  by?: string;
};

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** "12 May 2025" from "2025-05-12", without touching any clock or zone. */
export function spokenDate(date: string): string {
  return `${Number(date.slice(8, 10))} ${MONTHS[Number(date.slice(5, 7)) - 1] ?? ''} ${date.slice(0, 4)}`;
}

export function gateWhere(gate: GateAnswer): string {
  if (gate.position === 'before') return 'before the session';
  if (gate.afterBlock !== undefined) return `after block ${gate.afterBlock}`;
  return gate.position === 'after' ? 'after the session' : 'between blocks';
}

export const RED_FLAG_WORDS: Record<RedFlag, string> = {
  numbness: 'numbness',
  tingling: 'tingling',
  weakness: 'weakness',
  loss_of_control: 'loss of control',
  night_pain: 'night pain',
  swelling: 'swelling',
};

export function redFlagWords(flags: RedFlag[]): string {
  return flags.map((f) => RED_FLAG_WORDS[f]).join(', ');
}
