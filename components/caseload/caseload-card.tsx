import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { CaseloadEntry } from '@/shared/schemas/musician';
import { Card } from '@/components/ui/card';
import { AppText } from '@/components/ui/text';
import { AlertList } from './alert-list';
import { EventCell } from './event-cell';
import { JoinedBadge } from './joined-badge';
import { LastCheckIn } from './last-check-in';
import { PlanCell } from './plan-cell';
import { RecordLink } from './record-link';

/** One musician on a phone: alerts on top, then plan, event and last check-in. */
export function CaseloadCard({ entry }: { entry: CaseloadEntry }) {
  const { colors } = useTheme();
  return (
    <Card testID="caseload-entry">
      <View style={styles.head}>
        <RecordLink entry={entry} />
        <View style={styles.instrument}>
          <Icon name="musical-note-outline" size={16} color={colors.textMuted} />
          <AppText tone="muted">{entry.instrument}</AppText>
        </View>
      </View>
      {entry.alerts.length > 0 ? <AlertList alerts={entry.alerts} /> : null}
      <PlanCell entry={entry} />
      <EventCell entry={entry} />
      <View style={styles.foot}>
        <JoinedBadge entry={entry} />
        <LastCheckIn date={entry.lastCheckInDate} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm },
  foot: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm },
  instrument: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});
