import { StyleSheet, View } from 'react-native';
import { format } from 'date-fns/format';
import { spacing } from '@/constants/theme';
import { useAdminUsersQuery } from '@/hooks/use-admin-users';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { UserSummary } from '@/shared/schemas/user';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Table, type TableColumn } from '@/components/ui/table';
import { AppText } from '@/components/ui/text';
import { RoleBadge } from './role-badge';

const created = (user: UserSummary) => format(new Date(user.createdAt), 'd MMM yyyy');

const columns: TableColumn<UserSummary>[] = [
  { key: 'name', header: 'Name', flex: 2, render: (user) => <AppText variant="bodyStrong">{user.name}</AppText> },
  { key: 'email', header: 'E-mail', flex: 3, render: (user) => <AppText numberOfLines={1}>{user.email}</AppText> },
  { key: 'role', header: 'Role', flex: 2, render: (user) => <RoleBadge role={user.role} /> },
  { key: 'created', header: 'Created', flex: 1, render: (user) => <AppText tone="muted">{created(user)}</AppText> },
];

/** Every account, grouped by role. */
export function UserList() {
  const users = useAdminUsersQuery();
  const { isMedium } = useBreakpoints();

  if (users.isPending) return <LoadingState label="Loading accounts…" />;
  if (users.isError) return <ErrorState error={users.error} onRetry={() => users.refetch()} testID="users-error" />;
  if (isMedium) {
    return <Table testID="users-table" rowTestID="user-row" label="Accounts" columns={columns} rows={users.data} rowKey={(u) => u.id} />;
  }
  return (
    <View style={styles.cards}>
      {users.data.map((user) => (
        <Card key={user.id} testID="user-row">
          <AppText variant="heading">{user.name}</AppText>
          <AppText tone="muted" numberOfLines={1}>
            {user.email}
          </AppText>
          <View style={styles.meta}>
            <RoleBadge role={user.role} />
            <AppText variant="caption" tone="muted">{`Created ${created(user)}`}</AppText>
          </View>
        </Card>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  cards: { gap: spacing.md },
  meta: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, flexWrap: 'wrap' },
});
