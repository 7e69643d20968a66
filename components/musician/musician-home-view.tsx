import { StyleSheet, View } from 'react-native';
import Ionicons from '@expo/vector-icons/Ionicons';
import { spacing } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useMusicianHomeQuery } from '@/hooks/use-musician-home';
import { useTheme } from '@/hooks/use-theme';
import { Card } from '@/components/ui/card';
import { CautionCard } from '@/components/ui/caution-card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { AppText } from '@/components/ui/text';
import { PlanSummary } from './plan-summary';

/** The musician's landing screen: who they are in Ritorno, their plan (or that it is coming), and the cautions. */
export function MusicianHomeView() {
  const { colors } = useTheme();
  const { isWide } = useBreakpoints();
  const home = useMusicianHomeQuery();
  const firstName = home.data?.name.split(' ')[0];

  return (
    <Screen
      testID="screen-musician-home"
      title={firstName ? `Hello, ${firstName}` : 'Hello'}
      lead="Here you will find today’s playing session. Stop and report whenever something hurts."
      footer={<CautionCard audience="musician" />}
    >
      {home.isPending ? <LoadingState label="Loading your page…" /> : null}
      {home.isError ? <ErrorState error={home.error} onRetry={() => home.refetch()} testID="musician-home-error" /> : null}
      {home.data ? (
        <View style={[styles.grid, isWide && styles.gridWide]}>
          <View style={isWide ? styles.mainWide : undefined}>
            <PlanSummary plan={home.data.plan} clinicianName={home.data.clinicianName} />
          </View>
          <Card muted style={isWide ? styles.sideWide : undefined} testID="musician-profile">
            <AppText variant="label" tone="muted">
              You
            </AppText>
            <AppText variant="heading">{home.data.name}</AppText>
            <View style={styles.line}>
              <Ionicons name="musical-note-outline" size={18} color={colors.textMuted} />
              <AppText>{home.data.instrument}</AppText>
            </View>
            <View style={styles.line}>
              <Ionicons name="medkit-outline" size={18} color={colors.textMuted} />
              <AppText>{`Clinician: ${home.data.clinicianName}`}</AppText>
            </View>
          </Card>
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  grid: { gap: spacing.lg },
  gridWide: { flexDirection: 'row', alignItems: 'flex-start' },
  mainWide: { flex: 2 },
  sideWide: { flex: 1 },
  line: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
});
