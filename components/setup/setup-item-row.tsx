import { Pressable, StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { spacing, touchTarget } from '@/constants/theme';
import { useDeleteSetupItemMutation, useUpdateSetupItemMutation } from '@/hooks/use-setup';
import { useTheme } from '@/hooks/use-theme';
import type { SetupItem } from '@/shared/schemas/setup';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
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
      <Button testID={`setup-delete-${item.id}`} variant="ghost" icon="trash-outline" label="Remove" accessibilityLabel={`Remove ${item.label}`} onPress={() => remove.mutate(item.id)} loading={remove.isPending} />
    </Card>
  );
}

const styles = StyleSheet.create({
  toggle: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, minHeight: touchTarget },
  text: { flex: 1, gap: spacing.xxs },
});
