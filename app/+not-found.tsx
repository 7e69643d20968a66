import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { Brand } from '@/components/ui/brand';
import { AppText } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';

export default function NotFoundScreen() {
  const { colors } = useTheme();
  return (
    <View testID="screen-not-found" style={[styles.root, { backgroundColor: colors.background }]}>
      <Brand size={36} />
      <AppText variant="title">This page does not exist</AppText>
      <AppText tone="muted" style={styles.text}>
        The link may be mistyped or out of date. Go back to your start page and carry on from there.
      </AppText>
      <TextLink href="/" label="Go to my start page" testID="not-found-home" />
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: spacing.md, padding: spacing.xl },
  text: { textAlign: 'center', maxWidth: 420 },
});
