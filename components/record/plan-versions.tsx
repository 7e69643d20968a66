import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { format } from 'date-fns/format';
import { radii, spacing } from '@/constants/theme';
import { usePlanVersionsQuery } from '@/hooks/use-plans';
import { useTheme } from '@/hooks/use-theme';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { AppText } from '@/components/ui/text';
import { VersionStatusBadge } from './version-status-badge';

const when = (iso: string) => format(new Date(iso), 'd MMM yyyy');

/** Every version of the plan, newest first; drafts open for editing, the active one as a new version. */
export function PlanVersions({ id }: { id: string }) {
  const { colors } = useTheme();
  const router = useRouter();
  const versions = usePlanVersionsQuery(id);
  if (versions.isPending) return <LoadingState label="Loading versions…" />;
  if (versions.isError) return <ErrorState error={versions.error} onRetry={() => versions.refetch()} testID="versions-error" />;
  if (versions.data.length === 0) return <AppText tone="muted" testID="versions-empty">No plan yet. Start one with “New plan version”.</AppText>;
  return (
    <View style={[styles.list, { borderColor: colors.border, backgroundColor: colors.surface }]} testID="plan-versions">
      {versions.data.map((version, position) => (
        <View key={version.id} style={[styles.row, position > 0 && { borderTopWidth: 1, borderTopColor: colors.border }]} testID="plan-version-row">
          <View style={styles.text}>
            <View style={styles.title}>
              <AppText variant="bodyStrong">{`Version ${version.version}`}</AppText>
              <VersionStatusBadge status={version.status} />
            </View>
            <AppText variant="caption" tone="muted">
              {`${version.settings.event.name}, ${version.settings.event.date} · target ${version.settings.targetMinutesPerDay} min a day`}
            </AppText>
            <AppText variant="caption" tone="muted">
              {`Made by ${version.createdBy} on ${when(version.createdAt)}${version.activatedAt ? ` · activated ${when(version.activatedAt)}` : ''}`}
            </AppText>
          </View>
          {version.status === 'superseded' ? null : (
            <Button
              testID={`open-version-${version.version}`}
              variant="secondary"
              icon="create-outline"
              label={version.status === 'draft' ? 'Open draft' : 'Edit as new version'}
              accessibilityLabel={`${version.status === 'draft' ? 'Open draft' : 'Edit as a new version'}: version ${version.version}`}
              onPress={() => router.push({ pathname: '/musicians/[id]/plan/[planId]', params: { id, planId: version.id } })}
            />
          )}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderWidth: 1, borderRadius: radii.lg, overflow: 'hidden' },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md, padding: spacing.md },
  text: { flex: 1, minWidth: 220, gap: spacing.xxs },
  title: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
});
