import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { spacing } from '@/constants/theme';
import { usePlanStateQuery } from '@/hooks/use-plans';
import { openServerPath } from '@/lib/open-url';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Section } from '@/components/ui/section';
import { OverrideForm } from './override-form';
import { OverrideRecords } from './override-records';
import { PlanHistory } from './plan-history';
import { PlanVersions } from './plan-versions';
import { TwoPanes } from './two-panes';

/** Versions of the plan, the explained history of the progression, and the clinician's overrides. */
export function PlanTab({ id }: { id: string }) {
  const router = useRouter();
  const state = usePlanStateQuery(id);
  const active = state.data ?? null;
  const actions = (
    <View style={styles.actions}>
      <Button testID="plan-new-version" icon="add-circle-outline" label="New plan version" onPress={() => router.push({ pathname: '/musicians/[id]/plan/new', params: { id } })} />
      {active ? (
        <Button
          testID="plan-print"
          variant="secondary"
          icon="print-outline"
          label="Printable plan"
          accessibilityLabel="Open the printable plan in a new tab"
          onPress={() => openServerPath(`/api/musicians/${encodeURIComponent(id)}/plan/print`)}
        />
      ) : null}
    </View>
  );
  const main = (
    <>
      <Section title="Versions" description="Editing the active plan makes a new version; it takes over when you activate it.">
        {actions}
        <PlanVersions id={id} />
      </Section>
      {active ? (
        <Section title="How the plan has moved" description="Explained by the plan engine from the check-ins and your overrides.">
          <PlanHistory events={active.history} />
        </Section>
      ) : null}
    </>
  );
  const side = active ? (
    <>
      <Section title="Override the progression" description="Advance, hold, resume, step back or clear a red flag. Each needs a reason.">
        <Card>
          <OverrideForm id={id} />
        </Card>
      </Section>
      <Section title="Overrides recorded">
        <OverrideRecords overrides={active.overrides} />
      </Section>
    </>
  ) : null;
  return <TwoPanes main={main} side={side} />;
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm } });
