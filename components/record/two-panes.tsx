import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';

/** Side by side from the wide breakpoint, stacked on a phone. */
export function TwoPanes({ main, side }: { main: ReactNode; side: ReactNode }) {
  const { isWide } = useBreakpoints();
  return (
    <View style={[styles.panes, isWide && styles.wide]}>
      <View style={[styles.pane, isWide && styles.main]}>{main}</View>
      <View style={[styles.pane, isWide && styles.side]}>{side}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  panes: { gap: spacing.xl },
  wide: { flexDirection: 'row', alignItems: 'flex-start' },
  pane: { gap: spacing.xl },
  main: { flex: 3, minWidth: 0 },
  side: { flex: 2, minWidth: 0 },
});
