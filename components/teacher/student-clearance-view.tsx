import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useStudentClearanceQuery } from '@/hooks/use-students';
import { isApiError } from '@/lib/api-client';
import { formatPlanDate } from '@/lib/plan-dates';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { Section } from '@/components/ui/section';
import { TextLink } from '@/components/ui/text-link';
import { ClearanceLimits } from './clearance-limits';
import { PieceClearanceList } from './piece-clearance-list';
import { PrintNoteButton } from './print-note-button';
import { ProgrammeReadiness } from './programme-readiness';
import { StudentHeader } from './student-header';

const back = <TextLink href="/students" label="All students" testID="clearance-back" accessibilityLabel="Back to all your students" />;

/** One student's playing clearance for their teacher: limits now, pieces cleared and expected. */
export function StudentClearanceView({ studentId }: { studentId: string }) {
  const query = useStudentClearanceQuery(studentId);

  if (query.isPending || query.isError) {
    const gone = isApiError(query.error) && query.error.status === 404;
    return (
      <Screen testID="screen-student-clearance" title="Playing clearance">
        {back}
        {query.isPending ? <LoadingState label="Loading the clearance…" /> : null}
        {gone ? (
          <EmptyState icon="eye-off-outline" title="Not shared with you" testID="clearance-not-shared">
            This student does not share their playing clearance with you, or has stopped sharing it.
          </EmptyState>
        ) : query.isError ? (
          <ErrorState error={query.error} onRetry={() => query.refetch()} testID="clearance-error" />
        ) : null}
      </Screen>
    );
  }

  const clearance = query.data;
  const cleared = clearance.pieces.filter((piece) => piece.cleared);
  const notYet = clearance.pieces.filter((piece) => !piece.cleared);
  return (
    <Screen
      testID="screen-student-clearance"
      title={clearance.name}
      lead={`What ${clearance.name} may play now, as of ${formatPlanDate(clearance.asOf)}.`}
      actions={<PrintNoteButton studentId={clearance.id} studentName={clearance.name} />}
    >
      {back}
      <StudentHeader clearance={clearance} />
      <Section title="How much playing" description="Lessons, rehearsals and practice at home all count towards these limits.">
        <ClearanceLimits clearance={clearance} />
      </Section>
      <Section title="Cleared to play now">
        <PieceClearanceList pieces={cleared} asOf={clearance.asOf} label="Pieces cleared now" empty="No pieces are cleared at the moment." testID="pieces-cleared" />
      </Section>
      <Section
        title="Not yet cleared"
        description="Dates are projections from the current plan, not promises: they move if progress slows."
      >
        <PieceClearanceList pieces={notYet} asOf={clearance.asOf} label="Pieces not yet cleared" empty="Every piece is cleared." testID="pieces-not-yet" />
      </Section>
      {clearance.event ? (
        <Section title={`Programme for ${clearance.event.name}`}>
          <ProgrammeReadiness clearance={clearance} />
        </Section>
      ) : null}
      <View style={styles.spacer} />
    </Screen>
  );
}

const styles = StyleSheet.create({ spacer: { height: spacing.sm } });
