import Svg, { Circle, Rect } from 'react-native-svg';
import { useTheme } from '@/hooks/use-theme';

export interface LogoMarkProps {
  size?: number;
}

/**
 * Ritorno's mark: a start-repeat sign from music notation (thick bar, thin bar, two dots),
 * the written instruction to go back and play again, on a rounded tile.
 */
export function LogoMark({ size = 32 }: LogoMarkProps) {
  const { colors } = useTheme();
  return (
    <Svg width={size} height={size} viewBox="0 0 32 32" accessibilityElementsHidden importantForAccessibility="no">
      <Rect x={0} y={0} width={32} height={32} rx={9} fill={colors.primary} />
      <Rect x={8} y={7} width={4.5} height={18} rx={1} fill={colors.onPrimary} />
      <Rect x={15} y={7} width={1.6} height={18} rx={0.8} fill={colors.onPrimary} />
      <Circle cx={21.5} cy={12.5} r={2.2} fill={colors.accent} />
      <Circle cx={21.5} cy={19.5} r={2.2} fill={colors.accent} />
    </Svg>
  );
}
