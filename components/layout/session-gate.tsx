import { Suspense } from 'react';
import { StyleSheet, View } from 'react-native';
import { Redirect, Slot } from 'expo-router';
import { spacing } from '@/constants/theme';
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
  // The signed-in screens' chunk downloads while the account loads, not after it (in the browser only:
  // pre-rendering stops at the loading state).
  if (typeof window !== 'undefined') loadSignedInScreens().catch(() => undefined);
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
  return (
    <Suspense fallback={opening}>
      <AppShell me={me.data}>
        <Slot />
      </AppShell>
    </Suspense>
  );
}

const styles = StyleSheet.create({ center: { flex: 1, justifyContent: 'center', padding: spacing.xl } });
