import { StyleSheet, View } from 'react-native';
import { get, useFormState, type Control } from 'react-hook-form';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { PlanSettings } from '@/shared/schemas/plan-settings';
import { Card } from '@/components/ui/card';
import { Section } from '@/components/ui/section';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import type { GroupSpec } from './field-groups';
import type { PlanFormValues } from './plan-form';

const testIdOf = (name: string) => `plan-${name.replace(/\./g, '-')}`;

/** One group of plan settings as labelled text fields, two to a row on wider screens. */
export function FieldGroup({ group, control, children }: { group: GroupSpec; control: Control<PlanFormValues, unknown, PlanSettings>; children?: React.ReactNode }) {
  const { isMedium } = useBreakpoints();
  const { errors } = useFormState({ control, name: group.groupError ?? group.fields[0]?.name });
  const groupMessage: unknown = group.groupError ? get(errors, `${group.groupError}.message`) : undefined;
  return (
    <Section title={group.title} description={group.description} testID={`plan-group-${group.key}`}>
      <Card>
        <View style={styles.grid}>
          {group.fields.map((field) => (
            <View key={field.name} style={[styles.cell, isMedium && styles.half]}>
              <TextField
                control={control}
                name={field.name}
                label={field.label}
                hint={field.hint}
                testID={testIdOf(field.name)}
                keyboardType={field.kind === 'text' ? 'default' : 'number-pad'}
                autoCapitalize="none"
              />
            </View>
          ))}
        </View>
        {typeof groupMessage === 'string' ? (
          <AppText variant="caption" tone="danger" testID={`plan-group-${group.key}-error`}>
            {groupMessage}
          </AppText>
        ) : null}
        {children}
      </Card>
    </Section>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { width: '100%' },
  half: { width: '47%', flexGrow: 1 },
});
