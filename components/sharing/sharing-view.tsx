import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useSharesQuery } from '@/hooks/use-shares';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { Section } from '@/components/ui/section';
import { ShareActions } from './share-actions';
import { ShareForm } from './share-form';
import { ShareList } from './share-list';

function SharedWith() {
  const shares = useSharesQuery();
  if (shares.isPending) return <LoadingState label="Loading who sees your clearance…" />;
  if (shares.isError) return <ErrorState error={shares.error} onRetry={() => shares.refetch()} testID="shares-error" />;
  return (
    <ShareList
      shares={shares.data}
      empty="Nobody sees your clearance yet. Add your teacher or ensemble director to let them know what you may play."
      renderActions={(share) => <ShareActions share={share} />}
    />
  );
}

/** The musician decides who sees their playing clearance, and can stop at any time. */
export function SharingView() {
  const { isWide } = useBreakpoints();
  const add = (
    <Section title="Add a teacher or ensemble director" description="If they have no Ritorno account yet, we e-mail them an invitation.">
      <Card>
        <ShareForm />
      </Card>
    </Section>
  );
  return (
    <Screen
      testID="screen-sharing"
      title="Sharing"
      lead="People you add see the pieces you are cleared to play, how long you may play and when more is expected; never your pain scores, check-ins, notes or documents."
    >
      <View style={[styles.panes, isWide && styles.panesWide]}>
        <View style={[styles.main, isWide && styles.mainWide]}>
          <Section title="Who sees your clearance">
            <SharedWith />
          </Section>
          {isWide ? null : add}
        </View>
        {isWide ? <View style={styles.side}>{add}</View> : null}
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  panes: { gap: spacing.xl },
  panesWide: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xxl },
  main: { gap: spacing.xl },
  mainWide: { flex: 1, minWidth: 0 },
  side: { width: 360 },
});
