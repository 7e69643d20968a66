import { MailList } from '@/components/layout/lazy-screens';
import { Screen } from '@/components/ui/screen';

export default function MailboxScreen() {
  return (
    <Screen
      testID="screen-mailbox"
      title="Development mailbox"
      lead="E-mails the app sent while running with the local mail server. Open one to read it and follow its links."
    >
      <MailList />
    </Screen>
  );
}
