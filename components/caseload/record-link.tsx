import { Pressable, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Icon } from '@/components/ui/icon';
import { spacing, touchTarget } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { CaseloadEntry } from '@/shared/schemas/musician';
import { AppText } from '@/components/ui/text';

/** The musician's name, opening their record. */
export function RecordLink({ entry }: { entry: CaseloadEntry }) {
  const { colors } = useTheme();
  return (
    <Link href={{ pathname: '/musicians/[id]', params: { id: entry.id } }} asChild>
      <Pressable
        testID={`open-record-${entry.id}`}
        accessibilityRole="link"
        accessibilityLabel={`Open the record of ${entry.name}`}
        style={styles.hit}
      >
        <View style={styles.row}>
          <AppText variant="bodyStrong" tone="primary" style={styles.name}>
            {entry.name}
          </AppText>
          <Icon name="chevron-forward" size={16} color={colors.primary} />
        </View>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  hit: { minHeight: touchTarget, justifyContent: 'center', alignSelf: 'flex-start' },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  name: { textDecorationLine: 'underline' },
});
