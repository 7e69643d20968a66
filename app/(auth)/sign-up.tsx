import { useRouter } from 'expo-router';
import { AuthFrame } from '@/components/auth/auth-frame';
import { SignUpForm } from '@/components/auth/sign-up-form';

export default function SignUpScreen() {
  const router = useRouter();
  return (
    <AuthFrame
      testID="screen-sign-up"
      title="Create a clinician account"
      lead="For clinicians who prescribe return-to-playing plans. You can invite your musicians and their teachers next."
    >
      <SignUpForm onSignedUp={() => router.replace('/')} />
    </AuthFrame>
  );
}
