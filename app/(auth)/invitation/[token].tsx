import { useLocalSearchParams, useRouter } from 'expo-router';
import { AuthFrame } from '@/components/auth/auth-frame';
import { InvitationAcceptance } from '@/components/auth/invitation-acceptance';

export default function InvitationScreen() {
  const router = useRouter();
  const { token } = useLocalSearchParams<{ token: string }>();
  return (
    <AuthFrame testID="screen-invitation" title="Welcome to Ritorno" lead="Set a password to open your account.">
      <InvitationAcceptance token={typeof token === 'string' ? token : ''} onSignedIn={() => router.replace('/')} />
    </AuthFrame>
  );
}
