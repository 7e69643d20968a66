import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { SendOutcome } from '@/lib/check-in-queue';
import { AppText } from '@/components/ui/text';

/** Whether the server has the check-in yet, in words and an icon. */
export function SendStatus({ outcome }: { outcome: SendOutcome | undefined }) {
  const { colors } = useTheme();
  const look =
    outcome?.status === 'saved'
      ? { icon: 'cloud-done-outline' as const, color: colors.success, text: 'Saved' }
      : outcome?.status === 'rejected'
        ? { icon: 'alert-circle-outline' as const, color: colors.danger, text: `Not saved: ${outcome.message}` }
        : {
            icon: 'cloud-upload-outline' as const,
            color: colors.warning,
            text: outcome && outcome.attempts > 0 ? 'Waiting to send — kept on this device, trying again' : 'Sending…',
          };
  return (
    <View testID="send-status" accessibilityRole="text" accessibilityLiveRegion="polite" style={styles.row}>
      <Icon name={look.icon} size={20} color={look.color} />
      <AppText variant="label">{look.text}</AppText>
    </View>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm } });
