import { StyleSheet, View } from 'react-native';
import { useTheme } from '@/hooks/use-theme';

export interface LogoMarkProps {
  size?: number;
}

/**
 * Ritorno's mark: a start-repeat sign from music notation (thick bar, thin bar, two dots),
 * the written instruction to go back and play again, on a rounded tile.
 * Drawn with plain views on a 32-unit grid: it is on every screen, sign-in included, and an SVG
 * renderer would add its whole library to the JavaScript a first visit downloads.
 */
export function LogoMark({ size = 32 }: LogoMarkProps) {
  const { colors } = useTheme();
  const unit = size / 32;
  const box = (x: number, y: number, width: number, height: number, radius: number) => ({
    left: x * unit,
    top: y * unit,
    width: width * unit,
    height: height * unit,
    borderRadius: radius * unit,
  });
  return (
    <View
      style={[styles.tile, box(0, 0, 32, 32, 9), { backgroundColor: colors.primary }]}
      accessibilityElementsHidden
      importantForAccessibility="no-hide-descendants"
      aria-hidden
    >
      <View style={[styles.shape, box(8, 7, 4.5, 18, 1), { backgroundColor: colors.onPrimary }]} />
      <View style={[styles.shape, box(15, 7, 1.6, 18, 0.8), { backgroundColor: colors.onPrimary }]} />
      <View style={[styles.shape, box(19.3, 10.3, 4.4, 4.4, 2.2), { backgroundColor: colors.accent }]} />
      <View style={[styles.shape, box(19.3, 17.3, 4.4, 4.4, 2.2), { backgroundColor: colors.accent }]} />
    </View>
  );
}

const styles = StyleSheet.create({
  tile: { position: 'relative', overflow: 'hidden' },
  shape: { position: 'absolute' },
});
