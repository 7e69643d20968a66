import { useState } from 'react';
import { Modal, ScrollView, StyleSheet, View } from 'react-native';
import { maxFormWidth, spacing } from '@/constants/theme';
import { useCheckInQueue } from '@/hooks/use-check-ins';
import { useTheme } from '@/hooks/use-theme';
import { Button } from '@/components/ui/button';
import { CautionCard } from '@/components/ui/caution-card';
import { AppText } from '@/components/ui/text';
import { CheckOutcome } from './check-outcome';
import { PainCheckForm } from './pain-check-form';

export interface PainReportSheetProps {
  date: string;
  visible: boolean;
  onClose: () => void;
}

/** Report pain at any time, outside a session; over the threshold it ends the day's playing. */
export function PainReportSheet({ date, visible, onClose }: PainReportSheetProps) {
  const { colors } = useTheme();
  const { submit, outcome } = useCheckInQueue();
  const [clientKey, setClientKey] = useState<string | null>(null);
  const close = () => {
    setClientKey(null);
    onClose();
  };
  return (
    <Modal visible={visible} animationType="none" transparent onRequestClose={close}>
      <View style={[styles.backdrop, { backgroundColor: colors.overlay }]}>
        <ScrollView contentContainerStyle={styles.scroll}>
          <View style={[styles.sheet, { backgroundColor: colors.background }]} testID="pain-report">
            <AppText variant="title">Report pain</AppText>
            {clientKey ? (
              <CheckOutcome outcome={outcome(clientKey)} testID="pain-report-outcome" />
            ) : (
              <PainCheckForm testIDPrefix="report" submitLabel="Send to my plan" onSubmit={(pain, redFlags) => setClientKey(submit({ kind: 'pain_report', date, pain, redFlags }))} />
            )}
            <CautionCard audience="musician" />
            <Button testID="pain-report-close" label={clientKey ? 'Close' : 'Cancel'} variant="secondary" fullWidth onPress={close} />
          </View>
        </ScrollView>
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  backdrop: { flex: 1 },
  scroll: { flexGrow: 1, justifyContent: 'center', padding: spacing.md },
  sheet: { width: '100%', maxWidth: maxFormWidth + 80, alignSelf: 'center', borderRadius: 16, padding: spacing.lg, gap: spacing.lg },
});
