import { Suspense, useDeferredValue } from 'react';
import { StyleSheet, View } from 'react-native';
import { Redirect, Slot } from 'expo-router';
import { spacing } from '@/constants/theme';
import { useFirstReads } from '@/hooks/use-first-reads';
import { useMeQuery } from '@/hooks/use-me';
import { useTheme } from '@/hooks/use-theme';
import { isApiError } from '@/lib/api-client';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { AppShell, loadSignedInScreens } from './lazy-screens';

/** Signed-in screens only: loads the account, sends a signed-out visitor to sign-in. */
export function SessionGate() {
  const { colors } = useTheme();
  const me = useMeQuery();
  // The signed-in screens' chunk downloads while the account loads, not after it (in the browser; the
  // server's renderer loads it through the stand-ins in lazy-screens.tsx as it draws the page).
  if (typeof window !== 'undefined') loadSignedInScreens().catch(() => undefined);
  useFirstReads(me.data?.role);
  // The account comes in an update React must draw in one go (the query cache's). Drawn from a deferred
  // copy, the signed-in screens it opens are drawn in a second pass that React can pause for input.
  const account = useDeferredValue(me.data);
  const opening = (
    <View style={[styles.center, { backgroundColor: colors.background }]}>
      <LoadingState label="Opening Ritorno…" />
    </View>
  );
  if (me.isPending) return opening;
  if (me.isError) {
    if (isApiError(me.error) && me.error.status === 401) return <Redirect href="/sign-in" />;
    return (
      <View style={[styles.center, { backgroundColor: colors.background }]}>
        <ErrorState error={me.error} onRetry={() => me.refetch()} testID="session-error" />
      </View>
    );
  }
  if (!account) return opening;
  return (
    <Suspense fallback={opening}>
      <AppShell me={account}>
        <Slot />
      </AppShell>
    </Suspense>
  );
}

const styles = StyleSheet.create({ center: { flex: 1, justifyContent: 'center', padding: spacing.xl } });
