import { useEffect, useId, useRef, useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';
import type { IconName } from '@/components/ui/icon';
import { radii, spacing } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { Button } from './button';
import { AppText } from './text';

export interface ConfirmDeleteProps {
  /** The delete button's test id; the confirmation's parts add `-confirm`, `-yes`, `-no`. */
  testID: string;
  /** The button's words ("Remove", "Delete") and its spoken name ("Remove Quay Sonatina"). */
  label: string;
  accessibilityLabel: string;
  /** The question naming the thing: "Remove 'Quay Sonatina' from the repertoire?" */
  question: string;
  /** What is lost, in one line. */
  detail?: string;
  icon?: IconName;
  busy: boolean;
  /** A failed delete, shown inside the confirmation so the item stays and the reason is clear. */
  error?: string | null;
  /** Runs the delete; on success the row (and this confirmation with it) leaves the list. */
  onConfirm: () => void;
}

function focus(target: View | null) {
  const node = target as unknown as { focus?: () => void } | null;
  node?.focus?.();
}

/**
 * A delete button that asks first, in place (no browser dialog): the question names the thing, focus
 * moves to "Cancel", Escape cancels on the web, and focus returns to the button afterwards.
 */
export function ConfirmDelete({ testID, label, accessibilityLabel, question, detail, icon = 'trash-outline', busy, error, onConfirm }: ConfirmDeleteProps) {
  const { colors } = useTheme();
  const [open, setOpen] = useState(false);
  const trigger = useRef<View>(null);
  const cancelButton = useRef<View>(null);
  const wasOpen = useRef(false);
  const titleId = useId();

  useEffect(() => {
    if (open) focus(cancelButton.current);
    else if (wasOpen.current) focus(trigger.current);
    wasOpen.current = open;
  }, [open]);

  useEffect(() => {
    if (!open || Platform.OS !== 'web' || typeof document === 'undefined') return undefined;
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape' && !busy) setOpen(false);
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [open, busy]);

  if (!open) return <Button ref={trigger} testID={testID} variant="ghost" icon={icon} label={label} accessibilityLabel={accessibilityLabel} onPress={() => setOpen(true)} />;
  return (
    <View
      testID={`${testID}-confirm`}
      role="alertdialog"
      aria-labelledby={titleId}
      style={[styles.box, { borderColor: colors.danger, backgroundColor: colors.dangerSurface }]}
    >
      <AppText variant="bodyStrong" nativeID={titleId}>
        {question}
      </AppText>
      {detail ? <AppText variant="caption">{detail}</AppText> : null}
      {error ? (
        <AppText variant="caption" tone="danger" role="alert" testID={`${testID}-error`}>
          {`Not removed: ${error}`}
        </AppText>
      ) : null}
      <View style={styles.row}>
        <Button testID={`${testID}-yes`} icon={icon} label={`Yes, ${label.toLowerCase()}`} accessibilityLabel={accessibilityLabel} onPress={onConfirm} loading={busy} />
        <Button ref={cancelButton} testID={`${testID}-no`} variant="secondary" label="Cancel" onPress={() => setOpen(false)} disabled={busy} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { width: '100%', borderWidth: 1, borderRadius: radii.md, padding: spacing.md, gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
