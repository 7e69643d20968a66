import { View } from 'react-native';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import type { CaseloadEntry } from '@/shared/schemas/musician';
import { AppText } from '@/components/ui/text';

export function daysToWords(days: number): string {
  if (days === 0) return 'today';
  if (days < 0) return `${-days} day${days === -1 ? '' : 's'} ago`;
  return `in ${days} day${days === 1 ? '' : 's'}`;
}

/** The event and how far away it is. */
export function EventCell({ entry }: { entry: CaseloadEntry }) {
  if (!entry.plan) return <AppText tone="muted">No event set</AppText>;
  const { event, daysToEvent } = entry.plan;
  return (
    <View>
      <AppText variant="bodyStrong" numberOfLines={2}>
        {event.name}
      </AppText>
      <AppText variant="caption" tone="muted">
        {`${format(parseISO(event.date), 'd MMM yyyy')} · ${daysToWords(daysToEvent)}`}
      </AppText>
    </View>
  );
}
