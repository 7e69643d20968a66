import { StyleSheet, View } from 'react-native';
import { radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from '@/components/ui/text';

/** What the marks of the playing chart mean, shape and words together. */
export function ChartLegend() {
  const { colors } = useTheme();
  return (
    <View style={styles.row}>
      <View style={styles.item}>
        <View style={[styles.swatch, { backgroundColor: colors.surfaceMuted, borderColor: colors.borderStrong, borderWidth: 1 }]} />
        <AppText variant="caption">Planned minutes</AppText>
      </View>
      <View style={styles.item}>
        <View style={[styles.bar, { backgroundColor: colors.primary }]} />
        <AppText variant="caption">Played minutes</AppText>
      </View>
      <View style={styles.item}>
        <View style={[styles.ring, { borderColor: colors.danger }]}>
          <AppText variant="caption" tone="danger" style={styles.ringText}>
            3
          </AppText>
        </View>
        <AppText variant="caption">Pain (0-10); “!” a red flag</AppText>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  item: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  swatch: { width: 14, height: 14, borderRadius: 2 },
  bar: { width: 8, height: 14, borderRadius: 2 },
  ring: { width: 18, height: 18, borderRadius: radii.pill, borderWidth: 2, alignItems: 'center', justifyContent: 'center' },
  ringText: { fontSize: 10, lineHeight: 12 },
});
