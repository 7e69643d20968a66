import type { Tier } from '../schemas/piece';
import type { SessionItem } from './sessions';

/** What a block at a tier allows, in the musician's words. */
export function tierAllowance(tier: Tier | null | undefined): string {
  if (!tier) return 'technical exercises only';
  if (tier === 'easy') return 'easy pieces';
  return `pieces up to ${tier}`;
}

/**
 * One item of a session in plain words: the same line on the Today screen and in calendar descriptions.
 * `painThreshold` is the plan's stop threshold at the gates (0 = stop on any pain).
 */
export function sessionItemLine(item: Pick<SessionItem, 'kind' | 'minutes' | 'block' | 'tier' | 'gate'>, painThreshold: number): string {
  const min = `${item.minutes} min`;
  switch (item.kind) {
    case 'gate':
      if (item.gate?.position === 'before') return `Pain check before you start: stop if pain is above ${painThreshold}`;
      if (item.gate?.position === 'after') return 'Pain check after playing: pain, effort and minutes';
      return `Quick pain check after block ${item.gate?.afterBlock ?? ''}: stop if pain is above ${painThreshold}`;
    case 'warm_up':
      return `Warm up, ${min}`;
    case 'cool_down':
      return `Cool down, ${min}`;
    case 'rest':
      return `Rest, ${min}, instrument down`;
    case 'burst':
      return `Demanding passage, at most ${min}`;
    case 'play':
      return `Block ${item.block ?? ''}: ${min} of ${tierAllowance(item.tier)}`;
  }
}
