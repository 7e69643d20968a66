import { UserList } from '@/components/layout/lazy-screens';
import { Screen } from '@/components/ui/screen';

export default function UsersScreen() {
  return (
    <Screen
      testID="screen-admin-users"
      title="Accounts"
      lead="Everyone who can sign in to Ritorno. Clinicians sign up themselves; they invite their musicians and teachers."
    >
      <UserList />
    </Screen>
  );
}
