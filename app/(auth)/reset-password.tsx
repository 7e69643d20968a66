import { useLocalSearchParams } from 'expo-router';
import { AuthFrame } from '@/components/auth/auth-frame';
import { ResetPasswordForm } from '@/components/auth/reset-password-form';

export default function ResetPasswordScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  return (
    <AuthFrame testID="screen-reset-password" title="Choose a new password" lead="Type a new password for your account, then sign in with it.">
      <ResetPasswordForm token={typeof token === 'string' ? token : ''} />
    </AuthFrame>
  );
}
