import { StyleSheet, View } from 'react-native';
import { useController, type Control } from 'react-hook-form';
import { spacing } from '@/constants/theme';
import type { PlanSettings } from '@/shared/schemas/plan-settings';
import { Button } from '@/components/ui/button';
import { AppText } from '@/components/ui/text';
import type { PlanFormValues } from './plan-form';

/** The leading levels copied from a published table, with their source; they can be dropped. */
export function FixedLevelsNote({ control }: { control: Control<PlanFormValues, unknown, PlanSettings> }) {
  const { field, fieldState } = useController({ control, name: 'fixedLevels' });
  if (field.value.length === 0) return null;
  const issue = fieldState.error?.message ?? (Array.isArray(fieldState.error) ? 'Check the published levels against the minutes above.' : undefined);
  return (
    <View style={styles.box} testID="plan-fixed-levels">
      <AppText variant="label">First stages from a published table</AppText>
      {field.value.map((level) => (
        <AppText key={level.source} variant="caption" tone="muted">
          {`${level.minutesPerDay} min a day: play ${level.blockMinutes}, rest ${level.restMinutes}. ${level.source}.`}
        </AppText>
      ))}
      {issue ? <AppText variant="caption" tone="danger">{issue}</AppText> : null}
      <Button testID="plan-fixed-levels-remove" variant="ghost" icon="close-outline" label="Use our rule from stage 1 instead" onPress={() => field.onChange([])} />
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: spacing.xs } });
