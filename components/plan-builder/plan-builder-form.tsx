import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { assessFeasibility, publishedLevelsPreset, type Piece } from '@/shared/scheduler';
import { PlanSettingsSchema, type PlanSettings } from '@/shared/schemas/plan-settings';
import type { PlanVersion } from '@/shared/schemas/plan';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextLink } from '@/components/ui/text-link';
import { ActivateConfirm } from './activate-confirm';
import { FieldGroup } from './field-group';
import { FIELD_GROUPS } from './field-groups';
import { FixedLevelsNote } from './fixed-levels-note';
import { NextMorningToggle } from './next-morning-toggle';
import { PlanFormSchema, toFormValues, type PlanFormValues } from './plan-form';
import { PlanPreview } from './plan-preview';
import { RestDaysFields } from './rest-days-fields';
import { usePlanSave } from './use-plan-save';

export interface PlanBuilderFormProps {
  musicianId: string;
  initial: PlanSettings;
  opened: PlanVersion | null;
  pieces: readonly Piece[];
}

/** Every plan setting, grouped, beside a live preview; save as a draft, then activate. */
export function PlanBuilderForm({ musicianId, initial, opened, pieces }: PlanBuilderFormProps) {
  const { isWide } = useBreakpoints();
  const { control, handleSubmit, setError, setValue, reset, getValues } = useForm<PlanFormValues, unknown, PlanSettings>({
    resolver: zodResolver(PlanFormSchema),
    defaultValues: toFormValues(initial),
    mode: 'onChange',
  });
  const values = useWatch({ control }) as PlanFormValues;
  const plan = usePlanSave(musicianId, opened, setError);
  const [confirming, setConfirming] = useState<PlanVersion | null>(null);
  const [saved, setSaved] = useState<PlanVersion | null>(null);

  const applyPreset = () => {
    const merged = PlanSettingsSchema.safeParse({ ...PlanFormSchema.safeParse(getValues()).data, ...publishedLevelsPreset.values });
    const base = merged.success ? merged.data : PlanSettingsSchema.parse({ startDate: initial.startDate, event: initial.event, ...publishedLevelsPreset.values });
    reset(toFormValues(base));
  };
  const change = (field: 'targetMinutesPerDay' | 'event.date', value: string) =>
    setValue(field, value, { shouldValidate: true, shouldDirty: true });

  const onSave = handleSubmit(async (settings) => {
    setConfirming(null);
    setSaved(await plan.saveDraft(settings));
  });
  const onActivate = handleSubmit(async (settings) => {
    setSaved(null);
    setConfirming(await plan.saveDraft(settings));
  });

  const form = (
    <View style={styles.column}>
      <View style={styles.row}>
        <Button testID="plan-preset-published" variant="secondary" icon="library-outline" label={`Start from “${publishedLevelsPreset.label}”`} onPress={applyPreset} />
        <Button testID="plan-preset-defaults" variant="ghost" icon="refresh-outline" label="Start from the defaults" onPress={() => reset(toFormValues(PlanSettingsSchema.parse({ startDate: initial.startDate, event: initial.event })))} />
      </View>
      {FIELD_GROUPS.map((group) => (
        <FieldGroup key={group.key} group={group} control={control}>
          {group.key === 'minutes' ? <FixedLevelsNote control={control} /> : null}
          {group.key === 'progression' ? <NextMorningToggle control={control} /> : null}
        </FieldGroup>
      ))}
      <RestDaysFields control={control} />
    </View>
  );
  const preview = (
    <PlanPreview values={values} pieces={pieces} onShorterTarget={(m) => change('targetMinutesPerDay', String(m))} onLaterDate={(d) => change('event.date', d)} />
  );
  const feasibleNow = (() => {
    const parsed = PlanFormSchema.safeParse(values);
    return parsed.success ? assessFeasibility(parsed.data, [...pieces]).feasible : false;
  })();

  return (
    <View style={styles.column}>
      <View style={[styles.panes, isWide && styles.panesWide]}>
        <View style={[styles.column, isWide && styles.formPane]}>{form}</View>
        <View style={[styles.column, isWide && styles.previewPane]}>{preview}</View>
      </View>
      {plan.message ? <Banner tone="danger" testID="plan-save-error">{plan.message}</Banner> : null}
      {saved && !plan.activated ? <Banner tone="success" testID="plan-saved">{`Draft version ${saved.version} saved. Activate it when you are ready.`}</Banner> : null}
      {plan.activated ? (
        <Banner tone="success" title={`Version ${plan.activated.version} is active`} testID="plan-activated">
          {plan.activated.emailSent ? 'The musician has been e-mailed about the new plan.' : 'The plan is active, but the e-mail could not be sent. Tell the musician yourself.'}
        </Banner>
      ) : confirming ? (
        <ActivateConfirm version={confirming.version} feasible={feasibleNow} busy={plan.activating} onConfirm={() => void plan.activateDraft(confirming.id)} onCancel={() => setConfirming(null)} />
      ) : (
        <View style={styles.row}>
          <Button testID="plan-save" variant="secondary" icon="save-outline" label="Save as draft" onPress={onSave} loading={plan.saving && !confirming} />
          <Button testID="plan-activate" icon="rocket-outline" label="Activate…" accessibilityLabel="Save and activate this plan" onPress={onActivate} />
        </View>
      )}
      <TextLink href={{ pathname: '/musicians/[id]', params: { id: musicianId, tab: 'plan' } }} label="Back to the record" testID="plan-back" />
    </View>
  );
}

const styles = StyleSheet.create({
  column: { gap: spacing.xl },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  panes: { gap: spacing.xl },
  panesWide: { flexDirection: 'row', alignItems: 'flex-start' },
  formPane: { flex: 3, minWidth: 0 },
  previewPane: { flex: 2, minWidth: 0 },
});
