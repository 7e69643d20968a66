import { useMemo } from 'react';
import { View, StyleSheet } from 'react-native';
import { spacing } from '@/constants/theme';
import { assessFeasibility, buildStages, type Piece } from '@/shared/scheduler';
import { Banner } from '@/components/ui/banner';
import { Section } from '@/components/ui/section';
import { FeasibilityVerdict } from './feasibility-verdict';
import { PlanFormSchema, type PlanFormValues } from './plan-form';
import { StageTable } from './stage-table';
import { StagesChart } from './stages-chart';

export interface PlanPreviewProps {
  values: PlanFormValues;
  pieces: readonly Piece[];
  onShorterTarget: (minutes: number) => void;
  onLaterDate: (date: string) => void;
}

/** The engine runs here, on the device, as fields change: stages, their chart, and the verdict. */
export function PlanPreview({ values, pieces, onShorterTarget, onLaterDate }: PlanPreviewProps) {
  const result = useMemo(() => {
    const parsed = PlanFormSchema.safeParse(values);
    if (!parsed.success) return { ok: false as const, count: parsed.error.issues.length };
    const settings = parsed.data;
    return { ok: true as const, settings, stages: buildStages(settings), feasibility: assessFeasibility(settings, [...pieces]) };
  }, [values, pieces]);

  return (
    <Section title="Preview" description="Updates as you type; nothing is saved until you press Save." testID="plan-preview">
      {result.ok ? (
        <View style={styles.body} accessibilityLiveRegion="polite">
          <FeasibilityVerdict feasibility={result.feasibility} eventName={result.settings.event.name} onShorterTarget={onShorterTarget} onLaterDate={onLaterDate} />
          <StagesChart
            stages={result.stages}
            startDate={result.settings.startDate}
            eventDate={result.settings.event.date}
            eventName={result.settings.event.name}
            target={result.settings.targetMinutesPerDay}
          />
          <StageTable stages={result.stages} eventDate={result.settings.event.date} />
        </View>
      ) : (
        <Banner tone="info" testID="preview-waiting">
          {`Fix ${result.count === 1 ? 'the field' : `the ${result.count} fields`} marked in the form to see the stages and whether the event is in reach.`}
        </Banner>
      )}
    </Section>
  );
}

const styles = StyleSheet.create({ body: { gap: spacing.md } });
