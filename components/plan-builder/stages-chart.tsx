import { useState } from 'react';
import { View, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Rect, Text as SvgText } from 'react-native-svg';
import { fonts } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { daysBetween, type Stage } from '@/shared/scheduler';

const HEIGHT = 200;
const PAD = { left: 34, right: 12, top: 30, bottom: 24 };

const short = (date: string) => `${Number(date.slice(8, 10))}/${Number(date.slice(5, 7))}`;

/**
 * The stages as steps of minutes per day from the start to the event: stages after the event are
 * hatched out in the danger colour and labelled "late"; a dashed line marks the event. Hidden from
 * screen readers: the verdict and the stage list say the same in words.
 */
export function StagesChart({ stages, startDate, eventDate, eventName, target }: { stages: readonly Stage[]; startDate: string; eventDate: string; eventName: string; target: number }) {
  const { colors } = useTheme();
  const [width, setWidth] = useState(340);
  const last = stages[stages.length - 1];
  const end = last && last.endDate > eventDate ? last.endDate : eventDate;
  const span = Math.max(1, daysBetween(startDate, end) + 1);
  const max = Math.max(10, target, ...stages.map((s) => s.minutesPerDay));
  const plotW = width - PAD.left - PAD.right;
  const plotH = HEIGHT - PAD.top - PAD.bottom;
  const x = (date: string) => PAD.left + (daysBetween(startDate, date) / span) * plotW;
  const y = (m: number) => PAD.top + plotH - (m / max) * plotH;
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.max(280, e.nativeEvent.layout.width));
  const eventX = x(eventDate);
  return (
    <View onLayout={onLayout} testID="preview-stages-chart" accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
      <Svg width={width} height={HEIGHT}>
        {[0, target].map((m) => (
          <G key={m}>
            <Line x1={PAD.left} x2={width - PAD.right} y1={y(m)} y2={y(m)} stroke={m === 0 ? colors.borderStrong : colors.border} strokeDasharray={m === 0 ? undefined : '4 4'} />
            <SvgText x={PAD.left - 6} y={y(m) + 4} fontSize={11} fill={colors.textMuted} textAnchor="end" fontFamily={fonts.body}>
              {String(m)}
            </SvgText>
          </G>
        ))}
        {stages.map((stage) => {
          const x0 = x(stage.startDate);
          const x1 = PAD.left + ((daysBetween(startDate, stage.endDate) + 1) / span) * plotW;
          const late = stage.startDate > eventDate;
          return (
            <G key={stage.index}>
              <Rect x={x0} y={y(stage.minutesPerDay)} width={Math.max(1, x1 - x0 - 1)} height={y(0) - y(stage.minutesPerDay)} fill={late ? colors.dangerSurface : colors.primary} stroke={late ? colors.danger : colors.primary} strokeDasharray={late ? '3 2' : undefined} />
              {x1 - x0 > 16 ? (
                <SvgText x={(x0 + x1) / 2} y={y(stage.minutesPerDay) - 4} fontSize={10} fill={late ? colors.danger : colors.text} textAnchor="middle" fontFamily={fonts.bold}>
                  {String(stage.number)}
                </SvgText>
              ) : null}
            </G>
          );
        })}
        <Line x1={eventX} x2={eventX} y1={PAD.top - 12} y2={y(0)} stroke={colors.accent} strokeWidth={2} strokeDasharray="6 3" />
        <SvgText x={Math.min(eventX, width - PAD.right)} y={PAD.top - 16} fontSize={11} fill={colors.accent} textAnchor="end" fontFamily={fonts.bold}>
          {eventName || 'Event'}
        </SvgText>
        <SvgText x={PAD.left} y={HEIGHT - 6} fontSize={10} fill={colors.textMuted} fontFamily={fonts.body}>
          {short(startDate)}
        </SvgText>
        <SvgText x={width - PAD.right} y={HEIGHT - 6} fontSize={10} fill={colors.textMuted} textAnchor="end" fontFamily={fonts.body}>
          {short(end)}
        </SvgText>
      </Svg>
    </View>
  );
}
