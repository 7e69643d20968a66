import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useCheckInsQuery } from '@/hooks/use-check-ins';
import { useTodayQuery } from '@/hooks/use-today';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { CautionCard } from '@/components/ui/caution-card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { AppText } from '@/components/ui/text';
import { CheckInRow } from './check-in-row';
import { historyDays, historySummary } from './history-days';
import { MinutesChart } from './minutes-chart';

const PAGE = 20;

/** Past sessions and checks: a chart of minutes played with pain marks, its summary, and the list. */
export function HistoryView() {
  const { isWide } = useBreakpoints();
  const checkIns = useCheckInsQuery();
  const today = useTodayQuery();
  const [shown, setShown] = useState(PAGE);
  const list = checkIns.data ?? [];
  const lastDate = today.data?.date ?? list[0]?.date ?? null;
  const days = lastDate ? historyDays(list, lastDate, isWide ? 28 : 14) : [];
  return (
    <Screen testID="screen-history" title="History" lead="What you played and how it felt, newest first." footer={<CautionCard audience="musician" />}>
      {checkIns.isPending ? <LoadingState label="Loading your history…" /> : null}
      {checkIns.isError ? <ErrorState error={checkIns.error} onRetry={() => checkIns.refetch()} testID="history-error" /> : null}
      {checkIns.data && list.length === 0 ? (
        <EmptyState icon="time-outline" title="Nothing recorded yet" testID="history-empty">
          Your sessions and checks will appear here after the first one.
        </EmptyState>
      ) : null}
      {list.length > 0 ? (
        <View style={styles.column}>
          <Card testID="history-chart">
            <AppText variant="heading">Minutes played per day</AppText>
            <MinutesChart days={days} />
            <AppText testID="history-summary">{historySummary(days)}</AppText>
            <AppText variant="caption" tone="muted">Bars: minutes played. A ringed number: the highest pain that day. “!”: a warning sign.</AppText>
          </Card>
          <Card testID="history-list">
            {list.slice(0, shown).map((checkIn) => (
              <CheckInRow key={checkIn.id ?? `${checkIn.kind}-${checkIn.date}-${checkIn.recordedAt ?? ''}`} checkIn={checkIn} />
            ))}
            {list.length > shown ? <Button testID="history-more" label="Show more" variant="ghost" onPress={() => setShown((n) => n + PAGE)} /> : null}
          </Card>
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({ column: { gap: spacing.lg } });
