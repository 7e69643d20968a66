import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useLoadQuery } from '@/hooks/use-record';
import { isApiError } from '@/lib/api-client';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Section } from '@/components/ui/section';
import { AppText } from '@/components/ui/text';

const ratioText = (r: { acute: number; chronic: number; ratio: number } | null) =>
  r ? `${r.ratio.toFixed(2)} (${Math.round(r.acute)} against ${Math.round(r.chronic)} units)` : 'Not enough days yet';

/**
 * Session load = effort (CR-10) x minutes (Foster et al. 2001); the ratio of the last 7 days to the
 * 28-day level (Hulin et al. 2014) and its EWMA form (Williams et al. 2017). The warning is a prompt to
 * look, never a verdict (Gabbett 2016; the ranges come from sport).
 */
export function LoadCard({ id }: { id: string }) {
  const load = useLoadQuery(id);
  let body;
  if (load.isPending) body = <LoadingState label="Loading the load…" />;
  else if (load.isError && isApiError(load.error) && load.error.code === 'no_active_plan') {
    body = <AppText tone="muted">The load appears once a plan is active and sessions are reported.</AppText>;
  } else if (load.isError) body = <ErrorState error={load.error} onRetry={() => load.refetch()} testID="load-error" />;
  else {
    const { rolling, ewma, warning, days } = load.data;
    const last7 = days.slice(-7);
    const minutes = last7.reduce((sum, d) => sum + d.minutes, 0);
    const noEffort = last7.reduce((sum, d) => sum + d.sessionsWithoutEffort, 0);
    body = (
      <Card>
        <View style={styles.rows}>
          <AppText variant="label" tone="muted">Last 7 days against the 4-week level</AppText>
          <AppText variant="heading" testID="load-ratio">{ratioText(rolling)}</AppText>
          <AppText variant="caption" tone="muted">{`Smoothed (EWMA): ${ratioText(ewma)}`}</AppText>
          <AppText variant="caption">{`${minutes} minutes played in the last 7 days.`}</AppText>
          {noEffort > 0 ? (
            <AppText variant="caption" tone="muted">{`${noEffort} session${noEffort === 1 ? '' : 's'} without an effort rating count as no load.`}</AppText>
          ) : null}
        </View>
        {warning.message ? (
          <Banner tone="warning" title="Worth a look" testID="load-warning">
            {warning.message}
          </Banner>
        ) : (
          <Banner tone="success" testID="load-steady">
            Load is within the usual range (ratio at or under 1.3). A guide from sport, not a verdict.
          </Banner>
        )}
      </Card>
    );
  }
  return (
    <Section title="Playing load" description="Effort (0-10) times minutes per session." testID="record-load">
      {body}
    </Section>
  );
}

const styles = StyleSheet.create({ rows: { gap: spacing.xxs } });
