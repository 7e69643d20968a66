import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import type { GatePosition, RedFlag } from '@/shared/schemas/check-in';
import { Button } from '@/components/ui/button';
import { AppText } from '@/components/ui/text';
import { PainScalePicker } from './pain-scale-picker';
import { RedFlagQuestions } from './red-flag-questions';

export interface GateStepProps {
  position: GatePosition;
  afterBlock?: number;
  onAnswer: (pain: number, redFlags: RedFlag[]) => void;
}

const titles: Record<GatePosition, string> = {
  before: 'Before you start',
  between: 'Quick check',
  after: 'After playing',
};

/** A pain gate: the pain score and, before and after the session, the warning-sign questions. */
export function GateStep({ position, afterBlock, onAnswer }: GateStepProps) {
  const [pain, setPain] = useState<number | null>(null);
  const [flags, setFlags] = useState<RedFlag[]>([]);
  const [askFlags, setAskFlags] = useState(position !== 'between');
  return (
    <View style={styles.wrap} testID={`gate-${position}`}>
      <View style={styles.head}>
        <AppText variant="title">{titles[position]}</AppText>
        <AppText tone="muted">
          {position === 'between' && afterBlock ? `Block ${afterBlock} done. Any pain before you go on?` : 'How does the playing area feel?'}
        </AppText>
      </View>
      <PainScalePicker value={pain} onChange={setPain} testIDPrefix="gate-pain" />
      {askFlags ? (
        <RedFlagQuestions value={flags} onChange={setFlags} testIDPrefix="gate-flag" />
      ) : (
        <Button
          testID="gate-show-flags"
          variant="ghost"
          icon="alert-circle-outline"
          label="Numbness, tingling or another warning sign?"
          onPress={() => setAskFlags(true)}
        />
      )}
      <Button
        testID="gate-continue"
        label={pain === null ? 'Choose your pain first' : 'Continue'}
        icon="arrow-forward"
        fullWidth
        disabled={pain === null}
        onPress={() => {
          if (pain !== null) onAnswer(pain, flags);
        }}
      />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.lg }, head: { gap: spacing.xs } });
