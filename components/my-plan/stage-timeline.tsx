import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Line, Rect, Text as SvgText } from 'react-native-svg';
import { daysBetween } from '@/shared/scheduler';
import type { MyPlanStage } from '@/shared/schemas/my-plan';
import { fonts } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';

export interface StageTimelineProps {
  stages: MyPlanStage[];
  today: string;
  event: { name: string; date: string };
}

const HEIGHT = 200;
const PAD = { left: 36, right: 12, top: 24, bottom: 28 };

/**
 * Minutes per day, stage by stage, to the event: played stages solid, expected ones outlined, today a
 * line and the event a flag. A text list next to it says the same for screen readers.
 */
export function StageTimeline({ stages, today, event }: StageTimelineProps) {
  const { colors } = useTheme();
  const [width, setWidth] = useState(340);
  const first = stages[0]?.startDate ?? today;
  const end = event.date > today ? event.date : today;
  const span = Math.max(1, daysBetween(first, end) + 1);
  const max = Math.max(10, ...stages.map((s) => s.minutesPerDay));
  const plotW = width - PAD.left - PAD.right;
  const plotH = HEIGHT - PAD.top - PAD.bottom;
  const x = (date: string) => PAD.left + (Math.min(span, Math.max(0, daysBetween(first, date))) / span) * plotW;
  const y = (minutes: number) => PAD.top + plotH - (minutes / max) * plotH;
  const shown = stages.filter((s) => s.startDate <= end);
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.max(260, e.nativeEvent.layout.width));
  return (
    <View onLayout={onLayout} style={styles.wrap} testID="stage-timeline" accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
      <Svg width={width} height={HEIGHT}>
        {[0, max / 2, max].map((m) => (
          <SvgText key={m} x={PAD.left - 6} y={y(m) + 4} fontSize={11} fill={colors.textMuted} textAnchor="end" fontFamily={fonts.body}>
            {String(Math.round(m))}
          </SvgText>
        ))}
        <Line x1={PAD.left} x2={width - PAD.right} y1={y(0)} y2={y(0)} stroke={colors.borderStrong} />
        {shown.map((stage) => {
          const x1 = x(stage.startDate);
          const x2 = stage.endDate >= end ? x(end) + plotW / span : x(stage.endDate) + plotW / span;
          const projected = stage.kind === 'projected';
          return (
            <Rect
              key={`${stage.stageNumber}-${stage.startDate}`}
              x={x1}
              y={y(stage.minutesPerDay)}
              width={Math.max(1, x2 - x1 - 1)}
              height={y(0) - y(stage.minutesPerDay)}
              fill={projected ? colors.surfaceMuted : colors.primary}
              stroke={projected ? colors.primary : colors.primary}
              strokeDasharray={projected ? '4 3' : undefined}
              opacity={stage.current ? 1 : projected ? 0.9 : 0.75}
            />
          );
        })}
        <Line x1={x(today)} x2={x(today)} y1={PAD.top - 10} y2={y(0)} stroke={colors.accent} strokeWidth={2} />
        <SvgText x={x(today)} y={PAD.top - 12} fontSize={11} fill={colors.text} textAnchor="middle" fontFamily={fonts.bold}>
          Today
        </SvgText>
        <Line x1={x(event.date)} x2={x(event.date)} y1={PAD.top - 10} y2={y(0)} stroke={colors.text} strokeWidth={2} strokeDasharray="2 2" />
        <SvgText x={x(event.date) - 2} y={HEIGHT - 8} fontSize={11} fill={colors.text} textAnchor="end" fontFamily={fonts.bold}>
          {event.name}
        </SvgText>
        <SvgText x={PAD.left} y={HEIGHT - 8} fontSize={11} fill={colors.textMuted} fontFamily={fonts.body}>
          min/day
        </SvgText>
      </Svg>
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { width: '100%' } });
