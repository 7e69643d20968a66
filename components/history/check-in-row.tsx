import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { gateWhere, redFlagWords } from '@/shared/scheduler';
import type { CheckIn } from '@/shared/schemas/check-in';
import { AppText } from '@/components/ui/text';
import { effortWord, painWord } from '@/components/today/scale-words';

function describe(checkIn: CheckIn): { title: string; detail: string; pain: number } {
  if (checkIn.kind === 'session') {
    const worst = checkIn.gates.reduce((max, gate) => (gate.pain > max.pain ? gate : max), { position: 'before' as const, pain: 0 });
    const effort = checkIn.effort === undefined ? '' : ` · effort ${checkIn.effort} (${effortWord(checkIn.effort)})`;
    const pain = worst.pain > 0 ? `pain ${worst.pain} ${gateWhere(worst)}` : 'no pain at the checks';
    return { title: `Session ${checkIn.sessionIndex + 1}`, detail: `${checkIn.minutesPlayed} min played${effort} · ${pain}`, pain: worst.pain };
  }
  const title = checkIn.kind === 'next_morning' ? 'Morning check' : 'Pain report';
  return { title, detail: `pain ${checkIn.pain} (${painWord(checkIn.pain)})`, pain: checkIn.pain };
}

/** One check-in in the history list; pain and warning signs in words, not colour alone. */
export function CheckInRow({ checkIn }: { checkIn: CheckIn }) {
  const { colors } = useTheme();
  const { title, detail, pain } = describe(checkIn);
  const flagged = checkIn.redFlags.length > 0;
  const icon = flagged ? 'alert-circle' : pain > 0 ? 'warning-outline' : checkIn.kind === 'session' ? 'musical-notes-outline' : 'sunny-outline';
  return (
    <View style={[styles.row, { borderBottomColor: colors.border }]} testID="history-row">
      <Icon name={icon} size={20} color={flagged || pain > 0 ? colors.danger : colors.accent} style={styles.icon} />
      <View style={styles.flex}>
        <AppText variant="bodyStrong">{`${title} · ${format(parseISO(checkIn.date), 'EEE d MMM')}`}</AppText>
        <AppText variant="caption">{detail}</AppText>
        {flagged ? <AppText variant="caption" tone="danger">{`Warning sign: ${redFlagWords(checkIn.redFlags)}`}</AppText> : null}
        {checkIn.note ? <AppText variant="caption" tone="muted">{checkIn.note}</AppText> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: spacing.md, paddingVertical: spacing.sm, borderBottomWidth: 1 },
  icon: { marginTop: 2 },
  flex: { flex: 1, gap: spacing.xxs },
});
