import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import type { Today } from '@/shared/schemas/today';
import { Banner } from '@/components/ui/banner';
import { AppText } from '@/components/ui/text';

/** Why today looks the way it does (rest, held, stopped, ended...) and what comes next. */
export function DayStatus({ today }: { today: Today }) {
  const { overview, kind } = today;
  const next = overview.nextStageStartDate ? format(parseISO(overview.nextStageStartDate), 'EEEE d MMMM') : null;
  if (kind === 'stopped' || overview.redFlagActive) {
    return (
      <Banner tone="danger" title="All playing is stopped until your clinician has reviewed you" testID="day-status-stopped">
        {`${overview.lastChange ?? 'You reported a warning sign.'} Seek prompt clinical review; your clinician has been alerted. Contact them or an urgent care service if it gets worse.`}
      </Banner>
    );
  }
  if (kind === 'ended') {
    return (
      <Banner tone="warning" title="No more playing today" testID="day-status-ended">
        {`A pain check ended today’s playing. Rest. ${overview.lastChange ?? ''} Tomorrow morning you will be asked how it feels.`}
      </Banner>
    );
  }
  if (kind === 'rest') {
    return (
      <Banner tone="info" title="Rest day: no playing today" testID="day-status-rest">
        Rest days are part of the plan: tissues recover between playing days. Your next session is on the next playing day.
      </Banner>
    );
  }
  if (kind === 'before_start') {
    return (
      <Banner tone="info" title="Your plan has not started yet" testID="day-status-before">
        Keep to the advice from your appointment until the first session appears here.
      </Banner>
    );
  }
  if (overview.status === 'held' || overview.status === 'stepped_back') {
    return (
      <Banner tone="warning" title={overview.status === 'held' ? 'Holding at this stage' : 'Stepped back a stage'} testID="day-status-held">
        {`${overview.lastChange ?? ''} You move on again after playing days without symptoms, including the next morning.`}
      </Banner>
    );
  }
  if (kind === 'taper' || kind === 'event') {
    return (
      <Banner tone="info" title={kind === 'event' ? `${overview.event.name}: today` : 'A lighter day before the event'} testID="day-status-taper">
        {today.notes.join(' ') || 'No heavy practice the day before or on the day.'}
      </Banner>
    );
  }
  return (
    <AppText tone="muted" testID="day-status-on-track">
      {next ? `On schedule. Next stage from ${next} if your checks stay clear.` : 'On schedule.'}
    </AppText>
  );
}
