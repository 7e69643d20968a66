import type { RedFlag } from '@/shared/schemas/check-in';

/**
 * Pain 0-10 in words: mild 1-4, moderate 5-6, severe 7-10 (Serlin RC et al. 1995, Pain 61:277-284).
 * There is no single agreed set of cut points (Boonstra et al. 2014); these are the published ones we use.
 */
export function painWord(pain: number): string {
  if (pain <= 0) return 'No pain';
  if (pain <= 4) return 'Mild';
  if (pain <= 6) return 'Moderate';
  return 'Severe';
}

/**
 * Session effort on the CR-10 scale as used for session load (Foster C et al. 2001, J Strength Cond Res
 * 15(1):109-115). The anchor words are from memory of that table, not checked against the text.
 */
const EFFORT_WORDS: Record<number, string> = {
  0: 'Rest',
  1: 'Very, very easy',
  2: 'Easy',
  3: 'Moderate',
  4: 'Somewhat hard',
  5: 'Hard',
  6: 'Hard',
  7: 'Very hard',
  8: 'Very hard',
  9: 'Very hard',
  10: 'Maximal',
};

export function effortWord(effort: number): string {
  return EFFORT_WORDS[effort] ?? '';
}

/** The red-flag questions, asked in plain words. */
export const RED_FLAG_QUESTIONS: { flag: RedFlag; question: string }[] = [
  { flag: 'numbness', question: 'Numbness' },
  { flag: 'tingling', question: 'Tingling or pins and needles' },
  { flag: 'weakness', question: 'Weakness or dropping things' },
  { flag: 'loss_of_control', question: 'Loss of control of your fingers' },
  { flag: 'night_pain', question: 'Pain that wakes you at night' },
  { flag: 'swelling', question: 'A hot or swollen joint' },
];
