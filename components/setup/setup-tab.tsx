import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useSetupQuery } from '@/hooks/use-setup';
import { TwoPanes } from '@/components/record/two-panes';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Section } from '@/components/ui/section';
import { AppText } from '@/components/ui/text';
import { SetupForm } from './setup-form';
import { SetupItemRow } from './setup-item-row';

/** The setup and ergonomics checklist: what is prescribed, and whether each is shown as a reminder. */
export function SetupTab({ id }: { id: string }) {
  const setup = useSetupQuery(id);
  const list = (
    <Section title="Setup and ergonomics" description="Active items appear to the musician as reminders before playing." testID="record-setup">
      {setup.isPending ? <LoadingState label="Loading the checklist…" /> : null}
      {setup.isError ? <ErrorState error={setup.error} onRetry={() => setup.refetch()} testID="setup-load-error" /> : null}
      {setup.data?.length === 0 ? <AppText tone="muted">Nothing prescribed yet.</AppText> : null}
      <View style={styles.list}>
        {setup.data?.map((item) => (
          <SetupItemRow key={item.id} id={id} item={item} />
        ))}
      </View>
    </Section>
  );
  const form = (
    <Section title="Prescribe a modification">
      <Card>
        <SetupForm id={id} />
      </Card>
    </Section>
  );
  return <TwoPanes main={list} side={form} />;
}

const styles = StyleSheet.create({ list: { gap: spacing.sm } });
