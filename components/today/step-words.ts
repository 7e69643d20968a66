import type { Tier } from '@/shared/schemas/piece';
import type { ClearedPiece } from '@/shared/schemas/today';
import { tierAllowance as tierWords } from '@/shared/scheduler/session-words';
import type { SessionStep } from './session-machine';

export const TIER_WORDS: Record<Tier, string> = { easy: 'easy', moderate: 'moderate', demanding: 'demanding' };

type Timed = Extract<SessionStep, { kind: 'timed' }>;

export function stepTitle(step: Timed): string {
  switch (step.item) {
    case 'warm_up':
      return 'Warm up';
    case 'cool_down':
      return 'Cool down';
    case 'rest':
      return 'Rest';
    case 'burst':
      return `Block ${step.block ?? ''}: passage burst`;
    default:
      return `Block ${step.block ?? ''}`;
  }
}

export { tierAllowance as tierWords } from '@/shared/scheduler/session-words';

/** What to do in a timed step, named from today's cleared repertoire. */
export function whatToPlay(step: Timed, pieces: ClearedPiece[], maxBurstMinutes: number): string {
  if (step.item === 'rest') return 'Hands relaxed, shoulders down. The next block starts when the countdown ends.';
  if (step.item === 'warm_up') return 'Slow, soft, easy: long tones or open strings.';
  if (step.item === 'cool_down') return 'Easy and slow, then gentle stretches if your clinician gave you some.';
  const passages = pieces.flatMap((piece) => piece.passages.filter((p) => p.cleared).map((p) => `${piece.title}, ${p.bars}`));
  if (step.item === 'burst') {
    return passages.length > 0
      ? `One demanding passage, at most ${maxBurstMinutes} min: ${passages.join('; ')}.`
      : `A short demanding stretch, at most ${maxBurstMinutes} min.`;
  }
  const titles = pieces.map((piece) => piece.title);
  return titles.length > 0 ? `Play ${tierWords(step.tier)}: ${titles.join(', ')}.` : `Play ${tierWords(step.tier)}.`;
}
