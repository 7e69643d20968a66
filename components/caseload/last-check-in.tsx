import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { AppText } from '@/components/ui/text';

export function LastCheckIn({ date }: { date: string | null }) {
  return (
    <AppText variant="caption" tone={date ? 'default' : 'muted'}>
      {date ? format(parseISO(date), 'EEE d MMM') : 'No check-in yet'}
    </AppText>
  );
}
