import { useState } from 'react';
import { View, type LayoutChangeEvent } from 'react-native';
import Svg, { Circle, G, Line, Rect, Text as SvgText } from 'react-native-svg';
import { fonts } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { PlayingChart as Chart } from '@/shared/schemas/chart';

const HEIGHT = 220;
const PAD = { left: 34, right: 12, top: 34, bottom: 24 };

const short = (date: string) => `${Number(date.slice(8, 10))}/${Number(date.slice(5, 7))}`;

/**
 * Planned minutes per day as outlined columns, played minutes as filled bars inside them; a ringed
 * number marks pain, "!" a red flag; dashed lines mark today and the event. Hidden from screen
 * readers: the card beside it says the same in words.
 */
export function PlayingChart({ chart }: { chart: Chart }) {
  const { colors } = useTheme();
  const [width, setWidth] = useState(340);
  const days = chart.days;
  const max = Math.max(10, ...days.map((d) => Math.max(d.plannedMinutes, d.playedMinutes ?? 0)));
  const plotW = width - PAD.left - PAD.right;
  const plotH = HEIGHT - PAD.top - PAD.bottom;
  const slot = plotW / Math.max(1, days.length);
  const y = (m: number) => PAD.top + plotH - (m / max) * plotH;
  const x = (i: number) => PAD.left + slot * i + slot / 2;
  const indexOf = (date: string) => days.findIndex((d) => d.date === date);
  const todayAt = indexOf(chart.today);
  const eventAt = indexOf(chart.event.date);
  const labelEvery = Math.max(1, Math.ceil(days.length / Math.max(3, Math.floor(plotW / 56))));
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.max(280, e.nativeEvent.layout.width));

  return (
    <View onLayout={onLayout} testID="playing-chart" accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
      <Svg width={width} height={HEIGHT}>
        {[0, Math.round(max / 2), max].map((m) => (
          <G key={m}>
            <Line x1={PAD.left} x2={width - PAD.right} y1={y(m)} y2={y(m)} stroke={colors.border} />
            <SvgText x={PAD.left - 6} y={y(m) + 4} fontSize={11} fill={colors.textMuted} textAnchor="end" fontFamily={fonts.body}>
              {String(m)}
            </SvgText>
          </G>
        ))}
        {days.map((d, i) => {
          const cx = x(i);
          const w = Math.max(2, slot * 0.8);
          const played = d.playedMinutes ?? 0;
          const pain = Math.max(d.sessionPain ?? 0, d.morningPain ?? 0);
          const markY = Math.min(y(Math.max(d.plannedMinutes, played)), y(0)) - 10;
          return (
            <G key={d.date}>
              {d.plannedMinutes > 0 ? (
                <Rect x={cx - w / 2} y={y(d.plannedMinutes)} width={w} height={y(0) - y(d.plannedMinutes)} fill={colors.surfaceMuted} stroke={colors.borderStrong} strokeWidth={1} />
              ) : null}
              {played > 0 ? <Rect x={cx - w * 0.3} y={y(played)} width={w * 0.6} height={y(0) - y(played)} fill={colors.primary} /> : null}
              {pain > 0 || d.redFlag ? (
                <G>
                  <Circle cx={cx} cy={markY} r={8} fill={colors.surface} stroke={d.overThreshold || d.redFlag ? colors.danger : colors.warning} strokeWidth={2} />
                  <SvgText x={cx} y={markY + 4} fontSize={10} fill={colors.danger} textAnchor="middle" fontFamily={fonts.bold}>
                    {d.redFlag ? '!' : String(pain)}
                  </SvgText>
                </G>
              ) : null}
              {i % labelEvery === 0 ? (
                <SvgText x={cx} y={HEIGHT - 6} fontSize={10} fill={colors.textMuted} textAnchor="middle" fontFamily={fonts.body}>
                  {short(d.date)}
                </SvgText>
              ) : null}
            </G>
          );
        })}
        {todayAt >= 0 ? (
          <G>
            <Line x1={x(todayAt)} x2={x(todayAt)} y1={PAD.top - 14} y2={y(0)} stroke={colors.text} strokeDasharray="3 3" />
            <SvgText x={x(todayAt)} y={PAD.top - 18} fontSize={11} fill={colors.text} textAnchor="middle" fontFamily={fonts.bold}>
              Today
            </SvgText>
          </G>
        ) : null}
        {eventAt >= 0 ? (
          <G>
            <Line x1={x(eventAt)} x2={x(eventAt)} y1={PAD.top - 14} y2={y(0)} stroke={colors.accent} strokeWidth={2} strokeDasharray="6 3" />
            <SvgText x={x(eventAt) - 4} y={PAD.top - 18} fontSize={11} fill={colors.accent} textAnchor="end" fontFamily={fonts.bold}>
              {chart.event.name}
            </SvgText>
          </G>
        ) : null}
      </Svg>
    </View>
  );
}
