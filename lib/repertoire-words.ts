import type { Demand, Tier } from '@/shared/schemas/piece';

export const tierWords: Record<Tier, string> = { easy: 'Easy', moderate: 'Moderate', demanding: 'Demanding' };

const demandWords: Record<Demand, string> = {
  speed: 'speed',
  loudness: 'loudness',
  range: 'range',
  stretch: 'stretch',
  endurance: 'endurance',
};

/** "speed, stretch and loudness" */
export function demandsInWords(demands: readonly Demand[]): string {
  const words = demands.map((demand) => demandWords[demand]);
  if (words.length <= 1) return words.join('');
  return `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}
