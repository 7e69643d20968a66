import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { AppText } from '@/components/ui/text';

export interface ActivateConfirmProps {
  version: number;
  feasible: boolean;
  busy: boolean;
  onConfirm: () => void;
  onCancel: () => void;
}

/** A second, deliberate step before a plan goes live and the musician is e-mailed. */
export function ActivateConfirm({ version, feasible, busy, onConfirm, onCancel }: ActivateConfirmProps) {
  return (
    <View style={styles.box} testID="activate-confirm">
      <Banner tone={feasible ? 'info' : 'warning'} title={`Activate version ${version}?`}>
        {`It replaces the musician's current plan from now on and the musician is e-mailed.${feasible ? '' : ' The event is still out of reach on these settings.'}`}
      </Banner>
      <AppText variant="caption" tone="muted">This tool supports your clinical judgement and never replaces it.</AppText>
      <View style={styles.row}>
        <Button testID="activate-confirm-yes" icon="checkmark-circle-outline" label="Yes, activate and e-mail" onPress={onConfirm} loading={busy} />
        <Button testID="activate-confirm-no" variant="secondary" label="Not yet" onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
