import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import { spacing } from '@/constants/theme';
import type { Feasibility } from '@/shared/scheduler';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { AppText } from '@/components/ui/text';
import { PieceNames } from './piece-names';

const day = (date: string) => format(parseISO(date), 'EEE d MMM yyyy');

export interface FeasibilityVerdictProps {
  feasibility: Feasibility;
  eventName: string;
  onShorterTarget: (minutes: number) => void;
  onLaterDate: (date: string) => void;
}

/** In reach or not, in plain words; when not, the three options, two of which apply to the form. */
export function FeasibilityVerdict({ feasibility: f, eventName, onShorterTarget, onLaterDate }: FeasibilityVerdictProps) {
  if (f.feasible) {
    return (
      <Banner tone="success" title={`In reach of ${eventName || 'the event'}`} testID="preview-feasible">
        {`The target of ${f.targetMinutesPerDay} minutes a day is planned from ${day(f.targetReachedOn)}${f.programmeClearedOn ? `; the whole programme is cleared from ${day(f.programmeClearedOn)}` : ''}. Ready by ${day(f.readyBy)}, before the taper.`}
      </Banner>
    );
  }
  const { ready, withoutPassages, notReady } = f.reducedProgramme;
  return (
    <View style={styles.box} testID="preview-infeasible">
      <Banner tone="danger" title={`Out of reach: ${f.daysShort} day${f.daysShort === 1 ? '' : 's'} short`}>
        {`Under these caps the plan is not ready by ${day(f.readyBy)}, the last full day before the taper. By then it reaches ${f.minutesReachable} minutes a day. The caps are not squeezed to fit: choose one of the options below, or change the settings.`}
      </Banner>
      <AppText variant="heading">Options</AppText>
      <View style={styles.option} testID="option-reduced-programme">
        <AppText variant="bodyStrong">1. A reduced programme</AppText>
        <PieceNames title="Cleared in time" pieces={ready} testID="reduced-ready" />
        <PieceNames title="Cleared, but not their demanding passages" pieces={withoutPassages} testID="reduced-without-passages" />
        <PieceNames title="Not cleared in time" pieces={notReady} testID="reduced-not-ready" />
        {ready.length + withoutPassages.length + notReady.length === 0 ? (
          <AppText variant="caption" tone="muted">No pieces are on the event’s programme yet (see Repertoire).</AppText>
        ) : null}
      </View>
      <View style={styles.option}>
        <AppText variant="bodyStrong">{`2. A shorter target: ${f.minutesReachable} minutes a day`}</AppText>
        <Button testID="option-shorter-target" variant="secondary" icon="remove-circle-outline" label={`Set the target to ${f.minutesReachable} min`} onPress={() => onShorterTarget(f.minutesReachable)} />
      </View>
      <View style={styles.option}>
        <AppText variant="bodyStrong">{`3. A later event: on or after ${day(f.earliestFeasibleEventDate)}`}</AppText>
        <Button testID="option-later-date" variant="secondary" icon="calendar-outline" label={`Move the event to ${format(parseISO(f.earliestFeasibleEventDate), 'd MMM')}`} onPress={() => onLaterDate(f.earliestFeasibleEventDate)} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  option: { gap: spacing.xs },
});
