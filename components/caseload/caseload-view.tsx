import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { Card } from '@/components/ui/card';
import { CautionCard } from '@/components/ui/caution-card';
import { Screen } from '@/components/ui/screen';
import { Section } from '@/components/ui/section';
import { CaseloadList } from './caseload-list';
import { InvitationList } from './invitation-list';
import { InviteForm } from './invite-form';

/** The clinician's landing screen: who is in the caseload, and inviting more people. Two panes when wide. */
export function CaseloadView() {
  const { isWide } = useBreakpoints();
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
      lead="Musicians you look after. Invite a musician to add them here; once they join you can prepare their plan."
      footer={<CautionCard audience="clinician" />}
    >
      <View style={[styles.panes, isWide && styles.panesWide]}>
        <View style={[styles.main, isWide && styles.mainWide]}>
          <Section title="Musicians">
            <CaseloadList />
          </Section>
          {isWide ? null : invite}
          <Section title="Sent invitations">
            <InvitationList />
          </Section>
        </View>
        {isWide ? <View style={styles.side}>{invite}</View> : null}
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  panes: { gap: spacing.xl },
  panesWide: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xxl },
  main: { gap: spacing.xl },
  mainWide: { flex: 1, minWidth: 0 },
  side: { width: 340 },
});
