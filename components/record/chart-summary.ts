import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import type { PlayingChart } from '@/shared/schemas/chart';

const day = (date: string) => format(parseISO(date), 'd MMM');

/** The chart in sentences, for screen readers and for anyone who would rather read. */
export function chartSummary(chart: PlayingChart): string {
  const past = chart.days.filter((d) => d.date <= chart.today && d.date >= chart.startDate);
  const planned = past.reduce((sum, d) => sum + d.plannedMinutes, 0);
  const played = past.reduce((sum, d) => sum + (d.playedMinutes ?? 0), 0);
  const painDays = past.filter((d) => (d.sessionPain ?? 0) > 0 || (d.morningPain ?? 0) > 0);
  const overDays = past.filter((d) => d.overThreshold);
  const redFlagDays = past.filter((d) => d.redFlag);
  const parts = [
    `From ${day(chart.startDate)} to today (${day(chart.today)}): ${planned} minutes planned, ${played} minutes played.`,
    painDays.length === 0
      ? 'No pain reported.'
      : `Pain reported on ${painDays.length} day${painDays.length === 1 ? '' : 's'} (${painDays.map((d) => `${day(d.date)}: ${Math.max(d.sessionPain ?? 0, d.morningPain ?? 0)} of 10`).join(', ')}).`,
    overDays.length > 0 ? `Over the pain threshold on ${overDays.map((d) => day(d.date)).join(', ')}.` : '',
    redFlagDays.length > 0 ? `Red flag on ${redFlagDays.map((d) => day(d.date)).join(', ')}.` : '',
    `${chart.event.name} on ${day(chart.event.date)}.`,
  ];
  return parts.filter(Boolean).join(' ');
}
