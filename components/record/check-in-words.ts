import type { CheckInRow } from '@/shared/schemas/record';

const kindWords: Record<CheckInRow['kind'], string> = {
  session: 'Session',
  next_morning: 'Next morning',
  pain_report: 'Pain report',
};

const flagWords: Record<string, string> = {
  numbness: 'numbness',
  tingling: 'tingling',
  weakness: 'weakness',
  loss_of_control: 'loss of control',
  night_pain: 'night pain',
  swelling: 'swelling',
};

export function checkInKind(row: CheckInRow): string {
  return row.kind === 'session' && row.sessionIndex !== null ? `Session ${row.sessionIndex + 1}` : kindWords[row.kind];
}

export function painWords(row: CheckInRow): string {
  return `${row.highestPain} of 10${row.overThreshold ? ', over the threshold' : ''}`;
}

export function redFlagWords(row: CheckInRow): string {
  return row.redFlags.length === 0 ? 'None' : row.redFlags.map((flag) => flagWords[flag] ?? flag).join(', ');
}
