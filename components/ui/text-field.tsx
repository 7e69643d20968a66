import { useState } from 'react';
import { Pressable, StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { useController, type Control, type FieldPath, type FieldValues } from 'react-hook-form';
import { fonts, fontSizes, radii, spacing, touchTarget } from '@/constants/theme';
import { useTakenOver } from '@/hooks/use-taken-over';
import { useTheme } from '@/hooks/use-theme';
import { AppText } from './text';

type PassThrough = Pick<
  TextInputProps,
  'autoComplete' | 'keyboardType' | 'autoCapitalize' | 'returnKeyType' | 'onSubmitEditing' | 'placeholder' | 'textContentType'
>;

export interface TextFieldProps<T extends FieldValues, O = T> extends PassThrough {
  control: Control<T, unknown, O>;
  name: FieldPath<T>;
  label: string;
  testID: string;
  hint?: string;
  secret?: boolean;
}

/** The one text input of the app, bound to react-hook-form; shows its label, hint and error in words. */
export function TextField<T extends FieldValues, O = T>({
  control,
  name,
  label,
  testID,
  hint,
  secret = false,
  ...input
}: TextFieldProps<T, O>) {
  const { colors } = useTheme();
  const { field, fieldState } = useController<T, FieldPath<T>, O>({ control, name });
  const [focused, setFocused] = useState(false);
  const [revealed, setRevealed] = useState(false);
  // A page drawn by the server shows its fields before the app runs; React empties them when it takes the page
  // over, so what was typed before then would vanish. They take typing from that moment on.
  const takenOver = useTakenOver();
  const error = fieldState.error?.message;
  const value = typeof field.value === 'string' ? field.value : '';
  const borderColor = error ? colors.danger : focused ? colors.focus : colors.borderStrong;

  return (
    <View style={styles.wrap}>
      <AppText variant="label" nativeID={`${testID}-label`}>
        {label}
      </AppText>
      {hint ? (
        <AppText variant="caption" tone="muted">
          {hint}
        </AppText>
      ) : null}
      <View style={[styles.box, { borderColor, backgroundColor: colors.surface }, focused && styles.focused]}>
        <TextInput
          ref={field.ref}
          testID={testID}
          accessibilityLabel={label}
          accessibilityHint={error}
          aria-invalid={error ? true : undefined}
          value={value}
          editable={takenOver}
          onChangeText={field.onChange}
          onBlur={() => {
            setFocused(false);
            field.onBlur();
          }}
          onFocus={() => setFocused(true)}
          secureTextEntry={secret && !revealed}
          placeholderTextColor={colors.textMuted}
          style={[styles.input, { color: colors.text }]}
          {...input}
        />
        {secret ? (
          <Pressable
            testID={`${testID}-reveal`}
            accessibilityRole="button"
            accessibilityLabel={revealed ? 'Hide the characters' : 'Show the characters'}
            onPress={() => setRevealed((now) => !now)}
            style={styles.reveal}
          >
            <Icon name={revealed ? 'eye-off-outline' : 'eye-outline'} size={20} color={colors.textMuted} />
          </Pressable>
        ) : null}
      </View>
      {error ? (
        <View style={styles.errorRow} accessibilityLiveRegion="polite">
          <Icon name="alert-circle" size={16} color={colors.danger} />
          <AppText variant="caption" tone="danger" testID={`${testID}-error`} style={styles.errorText}>
            {error}
          </AppText>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  box: { flexDirection: 'row', alignItems: 'center', borderWidth: 1, borderRadius: radii.md, minHeight: touchTarget },
  // The thicker border is the focus indicator; the negative margin keeps the layout from shifting.
  focused: { borderWidth: 2, margin: -1 },
  input: {
    flex: 1,
    minHeight: touchTarget,
    paddingHorizontal: spacing.md,
    fontFamily: fonts.body,
    fontSize: fontSizes.md,
    // The box around the input shows focus (in the focus colour, 2 px), so the browser's own ring would double it.
    outlineWidth: 0,
  },
  reveal: { width: touchTarget, height: touchTarget, alignItems: 'center', justifyContent: 'center' },
  errorRow: { flexDirection: 'row', gap: spacing.xs, alignItems: 'flex-start' },
  errorText: { flex: 1 },
});
