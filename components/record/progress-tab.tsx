import { TwoPanes } from './two-panes';
import { ChartCard } from './chart-card';
import { CheckInHistory } from './check-in-history';
import { LoadCard } from './load-card';
import { PlanStatusCard } from './plan-status-card';

/** How the musician is doing: the plan's status, planned against played, load, and every check-in. */
export function ProgressTab({ id }: { id: string }) {
  return (
    <>
      <TwoPanes main={<ChartCard id={id} />} side={<><PlanStatusCard id={id} /><LoadCard id={id} /></>} />
      <CheckInHistory id={id} />
    </>
  );
}
