import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { CaseloadAlert } from '@/shared/schemas/musician';
import { AppText } from '@/components/ui/text';

const kindWords: Record<CaseloadAlert['kind'], string> = {
  red_flag: 'Red flag',
  failed_gate: 'Pain gate failed',
  infeasible: 'Event out of reach',
  load_warning: 'Load rising fast',
};

/** Alerts of one musician, urgent first; each says its kind in words beside the icon. */
export function AlertList({ alerts, compact = false }: { alerts: readonly CaseloadAlert[]; compact?: boolean }) {
  const { colors } = useTheme();
  if (alerts.length === 0) {
    return (
      <AppText variant="caption" tone="muted" testID="alerts-none">
        No alerts
      </AppText>
    );
  }
  return (
    <View style={styles.list} testID="alert-list">
      {alerts.map((alert) => {
        const urgent = alert.severity === 'urgent';
        return (
          <View key={`${alert.kind}-${alert.date ?? ''}`} style={styles.row} testID={`alert-${alert.kind}`}>
            <Icon name={urgent ? 'alert-circle' : 'warning-outline'} size={16} color={urgent ? colors.danger : colors.warning} style={styles.icon} />
            <View style={styles.text}>
              <AppText variant="label" tone={urgent ? 'danger' : 'warning'}>
                {`${urgent ? 'Urgent · ' : ''}${kindWords[alert.kind]}`}
              </AppText>
              {compact ? null : (
                <AppText variant="caption" tone="muted">
                  {alert.message}
                </AppText>
              )}
            </View>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.xs },
  row: { flexDirection: 'row', gap: spacing.xs, alignItems: 'flex-start' },
  icon: { marginTop: 2 },
  text: { flex: 1, gap: spacing.xxs },
});
