import { Pressable, StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { radii, spacing, touchTarget } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import type { RedFlag } from '@/shared/schemas/check-in';
import { AppText } from '@/components/ui/text';
import { RED_FLAG_QUESTIONS } from './scale-words';

export interface RedFlagQuestionsProps {
  value: RedFlag[];
  onChange: (flags: RedFlag[]) => void;
  testIDPrefix: string;
}

/** The warning signs as yes/no checkboxes; any "yes" stops all playing until a clinician reviews it. */
export function RedFlagQuestions({ value, onChange, testIDPrefix }: RedFlagQuestionsProps) {
  const { colors } = useTheme();
  const toggle = (flag: RedFlag) => onChange(value.includes(flag) ? value.filter((f) => f !== flag) : [...value, flag]);
  return (
    <View style={styles.wrap}>
      <AppText variant="bodyStrong">Do you have any of these now?</AppText>
      {RED_FLAG_QUESTIONS.map(({ flag, question }) => {
        const checked = value.includes(flag);
        return (
          <Pressable
            key={flag}
            testID={`${testIDPrefix}-${flag}`}
            accessibilityRole="checkbox"
            accessibilityLabel={question}
            aria-checked={checked}
            onPress={() => toggle(flag)}
            style={[styles.row, { borderColor: checked ? colors.danger : colors.border, backgroundColor: checked ? colors.dangerSurface : colors.surface }]}
          >
            <Icon name={checked ? 'checkbox' : 'square-outline'} size={24} color={checked ? colors.danger : colors.textMuted} />
            <AppText style={styles.text}>{question}</AppText>
            <AppText variant="label" tone={checked ? 'danger' : 'muted'}>
              {checked ? 'Yes' : 'No'}
            </AppText>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    minHeight: touchTarget,
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.sm,
    borderWidth: 1,
    borderRadius: radii.md,
  },
  text: { flex: 1 },
});
