import { Linking, Platform } from 'react-native';
import { studentPrintUrl } from '@/hooks/use-students';
import { Button } from '@/components/ui/button';

/** Opens the dated clearance note in a new tab, ready to print for a rehearsal. */
export function PrintNoteButton({ studentId, studentName }: { studentId: string; studentName: string }) {
  const open = () => {
    const url = studentPrintUrl(studentId);
    if (Platform.OS === 'web' && typeof window !== 'undefined') {
      window.open(url, '_blank', 'noopener');
      return;
    }
    void Linking.openURL(url);
  };
  return (
    <Button
      testID="clearance-print"
      label="Printable note"
      accessibilityLabel={`Open a printable clearance note for ${studentName}`}
      icon="print-outline"
      variant="secondary"
      onPress={open}
    />
  );
}
