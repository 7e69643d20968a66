import { Pressable, StyleSheet, View } from 'react-native';
import { radii, spacing, touchTarget } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from '@/components/ui/text';

export const RECORD_TABS = [
  { value: 'progress', label: 'Progress' },
  { value: 'plan', label: 'Plan' },
  { value: 'profile', label: 'Profile and notes' },
  { value: 'repertoire', label: 'Repertoire' },
  { value: 'setup', label: 'Setup' },
  { value: 'documents', label: 'Documents' },
  { value: 'activity', label: 'Activity' },
] as const;

export type RecordTab = (typeof RECORD_TABS)[number]['value'];

export function isRecordTab(value: unknown): value is RecordTab {
  return RECORD_TABS.some((tab) => tab.value === value);
}

/** The parts of a record; the chosen one is underlined and bold as well as tinted. */
export function RecordTabs({ value, onChange }: { value: RecordTab; onChange: (tab: RecordTab) => void }) {
  const { colors } = useTheme();
  return (
    <View accessibilityRole="tablist" style={[styles.bar, { borderBottomColor: colors.border }]}>
      {RECORD_TABS.map((tab) => {
        const selected = tab.value === value;
        return (
          <Pressable
            key={tab.value}
            testID={`record-tab-${tab.value}`}
            accessibilityRole="tab"
            accessibilityLabel={tab.label}
            aria-selected={selected}
            onPress={() => onChange(tab.value)}
            style={[styles.tab, selected && { borderBottomColor: colors.primary, backgroundColor: colors.surfaceMuted }]}
          >
            <AppText variant={selected ? 'bodyStrong' : 'body'} tone={selected ? 'primary' : 'muted'}>
              {tab.label}
            </AppText>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', flexWrap: 'wrap', borderBottomWidth: 1 },
  tab: {
    minHeight: touchTarget,
    paddingHorizontal: spacing.md,
    justifyContent: 'center',
    borderBottomWidth: 3,
    borderBottomColor: 'transparent',
    borderTopLeftRadius: radii.sm,
    borderTopRightRadius: radii.sm,
  },
});
