import { Pressable, StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { spacing, touchTarget } from '@/constants/theme';
import { useDeleteSetupItemMutation, useUpdateSetupItemMutation } from '@/hooks/use-setup';
import { useTheme } from '@/hooks/use-theme';
import type { SetupItem } from '@/shared/schemas/setup';
import { Card } from '@/components/ui/card';
import { ConfirmDelete } from '@/components/ui/confirm-delete';
import { AppText } from '@/components/ui/text';
import { setupKindWords } from './setup-words';

/** One prescribed modification, with a toggle for whether the musician is reminded of it. */
export function SetupItemRow({ id, item }: { id: string; item: SetupItem }) {
  const { colors } = useTheme();
  const update = useUpdateSetupItemMutation(id);
  const remove = useDeleteSetupItemMutation(id);
  return (
    <Card testID="setup-item">
      <Pressable
        testID={`setup-active-${item.id}`}
        accessibilityRole="switch"
        accessibilityLabel={`Remind the musician: ${item.label}`}
        aria-checked={item.active}
        aria-busy={update.isPending}
        onPress={() => update.mutate({ itemId: item.id, body: { active: !item.active } })}
        style={styles.toggle}
      >
        <Icon name={item.active ? 'checkbox' : 'square-outline'} size={24} color={item.active ? colors.primary : colors.textMuted} />
        <View style={styles.text}>
          <AppText variant="bodyStrong">{item.label}</AppText>
          <AppText variant="caption" tone="muted">{`${setupKindWords[item.kind]} · ${item.active ? 'active: shown to the musician' : 'paused: not shown'}`}</AppText>
        </View>
      </Pressable>
      {item.instructions ? <AppText variant="caption">{item.instructions}</AppText> : null}
      <ConfirmDelete
        testID={`setup-delete-${item.id}`}
        label="Remove"
        accessibilityLabel={`Remove ${item.label}`}
        question={`Remove ‘${item.label}’ from the setup?`}
        detail="The musician stops being reminded of it."
        busy={remove.isPending}
        error={remove.isError ? remove.error.message : null}
        onConfirm={() => remove.mutate(item.id)}
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  toggle: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, minHeight: touchTarget },
  text: { flex: 1, gap: spacing.xxs },
});
