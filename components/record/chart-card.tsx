import { useChartQuery } from '@/hooks/use-record';
import { isApiError } from '@/lib/api-client';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Section } from '@/components/ui/section';
import { AppText } from '@/components/ui/text';
import { ChartLegend } from './chart-legend';
import { chartSummary } from './chart-summary';
import { PlayingChart } from './playing-chart';

/** Planned against played minutes per day, with pain marks and the event date, and the same in words. */
export function ChartCard({ id }: { id: string }) {
  const chart = useChartQuery(id);
  let body;
  if (chart.isPending) body = <LoadingState label="Loading the chart…" />;
  else if (chart.isError && isApiError(chart.error) && chart.error.code === 'no_active_plan') {
    body = <AppText tone="muted">The chart appears once a plan is active.</AppText>;
  } else if (chart.isError) body = <ErrorState error={chart.error} onRetry={() => chart.refetch()} testID="chart-error" />;
  else {
    body = (
      <Card>
        <PlayingChart chart={chart.data} />
        <ChartLegend />
        <AppText variant="caption" testID="chart-summary">
          {chartSummary(chart.data)}
        </AppText>
      </Card>
    );
  }
  return (
    <Section title="Planned and played" description="Minutes per day from the start to the event." testID="record-chart">
      {body}
    </Section>
  );
}
