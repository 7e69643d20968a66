import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { LogoMark } from './logo-mark';
import { AppText } from './text';

/** The mark and the name together, read out once as "Ritorno". */
export function Brand({ size = 32 }: { size?: number }) {
  return (
    <View style={styles.row} accessible accessibilityLabel="Ritorno">
      <LogoMark size={size} />
      <AppText variant="title" style={{ fontSize: size * 0.75, lineHeight: size }}>
        Ritorno
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm } });
