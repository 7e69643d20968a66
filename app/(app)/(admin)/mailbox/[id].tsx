import { useLocalSearchParams } from 'expo-router';
import { MailMessage } from '@/components/layout/lazy-screens';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';

export default function MailMessageScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return (
    <Screen testID="screen-mail-message" title="Message" lead="Links in the text open here, so you can follow an invitation or a reset as its recipient would.">
      <TextLink href="/mailbox" label="Back to the mailbox" testID="mail-back" />
      <MailMessage id={typeof id === 'string' ? id : ''} />
    </Screen>
  );
}
