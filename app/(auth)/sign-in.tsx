import { useRouter } from 'expo-router';
import { AuthFrame } from '@/components/auth/auth-frame';
import { SignInForm } from '@/components/auth/sign-in-form';

export default function SignInScreen() {
  const router = useRouter();
  return (
    <AuthFrame testID="screen-sign-in" title="Sign in" lead="Use the e-mail and password of your Ritorno account.">
      <SignInForm onSignedIn={() => router.replace('/')} />
    </AuthFrame>
  );
}
