import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { Card } from '@/components/ui/card';
import { CautionCard } from '@/components/ui/caution-card';
import { Screen } from '@/components/ui/screen';
import { Section } from '@/components/ui/section';
import { CaseloadControls, type CaseloadShow } from './caseload-controls';
import { CaseloadList } from './caseload-list';
import { InvitationList } from './invitation-list';
import { InviteForm } from './invite-form';
import { SendSummaryButton } from './send-summary-button';
import type { CaseloadSort } from './sort-caseload';

/** The clinician's landing screen: who is in the caseload, and inviting more people. Two panes when wide. */
export function CaseloadView() {
  const { isWide } = useBreakpoints();
  const [sort, setSort] = useState<CaseloadSort>('alerts');
  const [show, setShow] = useState<CaseloadShow>('all');
  const invite = (
    <Section
      title="Invite someone"
      description="A musician joins your caseload straight away; a teacher can then be shown what their student is cleared to play."
    >
      <Card>
        <InviteForm />
      </Card>
    </Section>
  );
  return (
    <Screen
      testID="screen-caseload"
      title="Your caseload"
      lead="Musicians you look after, those needing attention first. Open a record to see check-ins, adjust the plan or add notes."
      actions={<SendSummaryButton />}
      footer={<CautionCard audience="clinician" />}
    >
      <Section title="Musicians">
        <CaseloadControls sort={sort} show={show} onSort={setSort} onShow={setShow} />
        <CaseloadList sort={sort} show={show} />
      </Section>
      <View style={[styles.panes, isWide && styles.panesWide]}>
        <View style={isWide ? styles.side : undefined}>{invite}</View>
        <Section title="Sent invitations" style={isWide ? styles.mainWide : undefined}>
          <InvitationList />
        </Section>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  panes: { gap: spacing.xl },
  panesWide: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xxl },
  mainWide: { flex: 1, minWidth: 0 },
  side: { width: 380 },
});
