import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useMusicianQuery } from '@/hooks/use-musicians';
import { AlertList } from '@/components/caseload/alert-list';
import { CaseloadStatusBadge } from '@/components/caseload/caseload-status-badge';
import { DocumentsTab } from '@/components/documents/documents-tab';
import { RepertoireTab } from '@/components/repertoire/repertoire-tab';
import { SetupTab } from '@/components/setup/setup-tab';
import { CautionCard } from '@/components/ui/caution-card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { PlanTab } from './plan-tab';
import { ProfileTab } from './profile-tab';
import { ProgressTab } from './progress-tab';
import { RecordTabs, type RecordTab } from './record-tabs';
import { ActivityTab } from './activity-tab';

/** One musician's record for their clinician, in tabs (phone and wide alike; wide tabs use two panes). */
export function RecordView({ id, initialTab }: { id: string; initialTab: RecordTab }) {
  const musician = useMusicianQuery(id);
  const [tab, setTab] = useState<RecordTab>(initialTab);

  if (musician.isPending) return <LoadingState label="Loading the record…" />;
  if (musician.isError) return <ErrorState error={musician.error} onRetry={() => musician.refetch()} testID="record-error" />;
  const entry = musician.data;
  return (
    <Screen
      testID="screen-record"
      title={entry.name}
      lead={`${entry.instrument} · ${entry.email}`}
      actions={<CaseloadStatusBadge status={entry.status} />}
      footer={<CautionCard audience="clinician" />}
    >
      <View style={styles.top}>
        <TextLink href="/caseload" label="Back to the caseload" testID="record-back" />
        {entry.alerts.length > 0 ? <AlertList alerts={entry.alerts} /> : null}
      </View>
      <RecordTabs value={tab} onChange={setTab} />
      {tab === 'progress' ? <ProgressTab id={id} /> : null}
      {tab === 'plan' ? <PlanTab id={id} /> : null}
      {tab === 'profile' ? <ProfileTab id={id} /> : null}
      {tab === 'repertoire' ? <RepertoireTab id={id} /> : null}
      {tab === 'setup' ? <SetupTab id={id} /> : null}
      {tab === 'documents' ? <DocumentsTab id={id} /> : null}
      {tab === 'activity' ? <ActivityTab id={id} /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({ top: { gap: spacing.sm } });
