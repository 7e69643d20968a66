import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import type { RedFlag } from '@/shared/schemas/check-in';
import { Button } from '@/components/ui/button';
import { PainScalePicker } from './pain-scale-picker';
import { RedFlagQuestions } from './red-flag-questions';

export interface PainCheckFormProps {
  testIDPrefix: string;
  submitLabel: string;
  painLabel?: string;
  onSubmit: (pain: number, redFlags: RedFlag[]) => void;
}

/** Pain 0-10 and the warning-sign questions, outside a session (the morning check, a pain report). */
export function PainCheckForm({ testIDPrefix, submitLabel, painLabel, onSubmit }: PainCheckFormProps) {
  const [pain, setPain] = useState<number | null>(null);
  const [flags, setFlags] = useState<RedFlag[]>([]);
  return (
    <View style={styles.wrap}>
      <PainScalePicker value={pain} onChange={setPain} testIDPrefix={`${testIDPrefix}-pain`} label={painLabel} />
      <RedFlagQuestions value={flags} onChange={setFlags} testIDPrefix={`${testIDPrefix}-flag`} />
      <Button
        testID={`${testIDPrefix}-submit`}
        label={pain === null ? 'Choose your pain first' : submitLabel}
        icon="send"
        fullWidth
        disabled={pain === null}
        onPress={() => {
          if (pain !== null) onSubmit(pain, flags);
        }}
      />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.lg } });
