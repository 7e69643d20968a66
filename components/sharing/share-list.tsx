import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { Share } from '@/shared/schemas/share';
import { AppText } from '@/components/ui/text';
import { ShareStatusBadge } from './share-status-badge';

export interface ShareListProps {
  shares: readonly Share[];
  /** Shown when nobody sees the clearance. */
  empty: string;
  /** Controls for one row (the musician's own screen); left out where the list is read only. */
  renderActions?: (share: Share) => ReactNode;
  testID?: string;
}

export function shareKey(share: Share): string {
  return share.teacherId ?? `invited:${share.email}`;
}

/** Teachers and ensemble directors who see a musician's clearance, and invitations still open. */
export function ShareList({ shares, empty, renderActions, testID = 'share-list' }: ShareListProps) {
  const { colors } = useTheme();
  if (shares.length === 0) {
    return (
      <AppText tone="muted" testID={`${testID}-empty`}>
        {empty}
      </AppText>
    );
  }
  return (
    <View testID={testID} style={[styles.list, { borderColor: colors.border, backgroundColor: colors.surface }]}>
      {shares.map((share, position) => (
        <View
          key={shareKey(share)}
          testID="share-row"
          style={[styles.row, position > 0 && { borderTopWidth: 1, borderTopColor: colors.border }]}
        >
          <View style={styles.top}>
            <View style={styles.who}>
              <AppText variant="bodyStrong">{share.name}</AppText>
              <AppText variant="caption" tone="muted" numberOfLines={1}>
                {share.email}
              </AppText>
              <AppText variant="caption" tone="muted">
                {`${share.status === 'active' ? 'Shared since' : 'Invited on'} ${format(new Date(share.since), 'd MMM yyyy')}`}
              </AppText>
            </View>
            <ShareStatusBadge status={share.status} />
          </View>
          {renderActions ? renderActions(share) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderWidth: 1, borderRadius: radii.lg, overflow: 'hidden' },
  row: { padding: spacing.md, gap: spacing.sm },
  top: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.sm, justifyContent: 'space-between' },
  who: { flexShrink: 1, minWidth: 180, gap: spacing.xxs },
});
