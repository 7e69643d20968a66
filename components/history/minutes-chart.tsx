import { useState } from 'react';
import { View, type LayoutChangeEvent } from 'react-native';
import Svg, { Circle, G, Line, Rect, Text as SvgText } from 'react-native-svg';
import { fonts } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { HistoryDay } from './history-days';

const HEIGHT = 180;
const PAD = { left: 32, right: 8, top: 28, bottom: 22 };

/** Minutes played per day as bars; a ringed number marks pain above 0 and "!" a warning sign. */
export function MinutesChart({ days }: { days: HistoryDay[] }) {
  const { colors } = useTheme();
  const [width, setWidth] = useState(340);
  const max = Math.max(10, ...days.map((d) => d.minutes));
  const plotW = width - PAD.left - PAD.right;
  const plotH = HEIGHT - PAD.top - PAD.bottom;
  const slot = plotW / Math.max(1, days.length);
  const y = (m: number) => PAD.top + plotH - (m / max) * plotH;
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.max(260, e.nativeEvent.layout.width));
  return (
    <View onLayout={onLayout} testID="minutes-chart" accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
      <Svg width={width} height={HEIGHT}>
        {[0, max].map((m) => (
          <SvgText key={m} x={PAD.left - 6} y={y(m) + 4} fontSize={11} fill={colors.textMuted} textAnchor="end" fontFamily={fonts.body}>
            {String(m)}
          </SvgText>
        ))}
        <Line x1={PAD.left} x2={width - PAD.right} y1={y(0)} y2={y(0)} stroke={colors.borderStrong} />
        {days.map((day, i) => {
          const cx = PAD.left + slot * i + slot / 2;
          const top = y(day.minutes);
          const pain = day.maxPain ?? 0;
          return (
            <G key={day.date}>
              {day.minutes > 0 ? <Rect x={cx - slot * 0.35} y={top} width={slot * 0.7} height={y(0) - top} fill={colors.primary} rx={2} /> : null}
              {pain > 0 || day.redFlag ? (
                <>
                  <Circle cx={cx} cy={Math.min(top, y(0)) - 10} r={8} fill={colors.surface} stroke={colors.danger} strokeWidth={2} />
                  <SvgText x={cx} y={Math.min(top, y(0)) - 6} fontSize={10} fill={colors.danger} textAnchor="middle" fontFamily={fonts.bold}>
                    {day.redFlag ? '!' : String(pain)}
                  </SvgText>
                </>
              ) : null}
              {i % 7 === (days.length - 1) % 7 ? (
                <SvgText x={cx} y={HEIGHT - 6} fontSize={10} fill={colors.textMuted} textAnchor="middle" fontFamily={fonts.body}>
                  {`${Number(day.date.slice(8, 10))}/${Number(day.date.slice(5, 7))}`}
                </SvgText>
              ) : null}
            </G>
          );
        })}
      </Svg>
    </View>
  );
}
