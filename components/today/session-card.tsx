import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { DaySession } from '@/shared/schemas/today';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { StatusBadge } from '@/components/ui/status-badge';
import { AppText } from '@/components/ui/text';
import { sessionItemLine } from '@/shared/scheduler/session-words';

export interface SessionCardProps {
  session: DaySession;
  /** Only the first session not yet done may start. */
  canStart: boolean;
  /** A place in this session is kept on the device: the button continues it. */
  resumable?: boolean;
  onStart: () => void;
  /** The plan's stop threshold at the gates, said in the pain checks. */
  painThreshold: number;
}

const icons = { gate: 'shield-checkmark-outline', warm_up: 'sunny-outline', play: 'musical-notes-outline', burst: 'flash-outline', rest: 'cafe-outline', cool_down: 'leaf-outline' } as const;

/** One of today's sessions as its blocks, rests and checks, with the way to start it. */
export function SessionCard({ session, canStart, resumable = false, onStart, painThreshold }: SessionCardProps) {
  const { colors } = useTheme();
  const label = `Session ${session.index + 1}`;
  return (
    <Card testID={`session-card-${session.index}`}>
      <View style={styles.head}>
        <AppText variant="heading" style={styles.flex}>{`${label} · ${session.startTime}`}</AppText>
        {session.done ? <StatusBadge tone="success" icon="checkmark-circle" label="Done" testID={`session-done-${session.index}`} /> : null}
      </View>
      <AppText tone="muted">{`${session.playingMinutes} min of playing`}</AppText>
      <View style={styles.items}>
        {session.items.map((item) => (
          <View key={`${item.kind}-${item.startMinute}-${item.gate?.position ?? ''}`} style={styles.item}>
            <Icon name={icons[item.kind]} size={18} color={item.kind === 'rest' ? colors.info : colors.accent} />
            <AppText variant={item.kind === 'gate' ? 'caption' : 'body'} tone={item.kind === 'gate' ? 'muted' : 'default'}>
              {sessionItemLine(item, painThreshold)}
            </AppText>
          </View>
        ))}
      </View>
      {!session.done ? (
        <Button
          testID={`session-start-${session.index}`}
          label={canStart ? `${resumable ? 'Continue' : 'Start'} ${label.toLowerCase()}` : 'After the session before'}
          accessibilityLabel={`${resumable ? 'Continue' : 'Start'} ${label}`}
          icon="play"
          fullWidth
          disabled={!canStart}
          onPress={onStart}
        />
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
  flex: { flex: 1 },
  items: { gap: spacing.xs, paddingVertical: spacing.xs },
  item: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
});
