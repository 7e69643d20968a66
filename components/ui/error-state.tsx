import { View, StyleSheet } from 'react-native';
import { spacing } from '@/constants/theme';
import { isApiError } from '@/lib/api-client';
import { Banner } from './banner';
import { Button } from './button';

export interface ErrorStateProps {
  error: unknown;
  onRetry?: () => void;
  testID?: string;
}

/** Says what went wrong in the server's own words, with a way to try again. */
export function ErrorState({ error, onRetry, testID = 'error-state' }: ErrorStateProps) {
  const message = isApiError(error) ? error.message : 'Something went wrong while loading this page.';
  return (
    <View style={styles.box} testID={testID}>
      <Banner tone="danger" title="This could not be loaded">
        {message}
      </Banner>
      {onRetry ? <Button testID={`${testID}-retry`} label="Try again" icon="refresh" variant="secondary" onPress={onRetry} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: spacing.md } });
