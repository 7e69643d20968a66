import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import type { CaseloadStatus } from '@/shared/schemas/musician';
import { SegmentedControl } from '@/components/ui/segmented-control';
import type { CaseloadSort } from './sort-caseload';

export type CaseloadShow = 'all' | 'alerts' | Extract<CaseloadStatus, 'held' | 'stepped_back' | 'stopped'>;

const sortOptions = [
  { value: 'alerts', label: 'Alerts', testID: 'caseload-sort-alerts' },
  { value: 'name', label: 'Name', testID: 'caseload-sort-name' },
  { value: 'event', label: 'Event', testID: 'caseload-sort-event' },
  { value: 'last_check_in', label: 'Check-in', testID: 'caseload-sort-last_check_in' },
] as const;

const showOptions = [
  { value: 'all', label: 'Everyone', testID: 'caseload-show-all' },
  { value: 'alerts', label: 'Alerts', testID: 'caseload-show-alerts' },
  { value: 'held', label: 'Held', testID: 'caseload-show-held' },
  { value: 'stopped', label: 'Stopped', testID: 'caseload-show-stopped' },
] as const;

export interface CaseloadControlsProps {
  sort: CaseloadSort;
  show: CaseloadShow;
  onSort: (sort: CaseloadSort) => void;
  onShow: (show: CaseloadShow) => void;
}

/** Order and filter of the caseload; both go to the API as query parameters. */
export function CaseloadControls({ sort, show, onSort, onShow }: CaseloadControlsProps) {
  return (
    <View style={styles.row}>
      <View style={styles.control}>
        <SegmentedControl label="Sort by" options={sortOptions} value={sort} onChange={onSort} />
      </View>
      <View style={styles.control}>
        <SegmentedControl label="Show" options={showOptions} value={show} onChange={onShow} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  control: { flexGrow: 1, flexBasis: 300 },
});
