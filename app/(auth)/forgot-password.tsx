import { AuthFrame } from '@/components/auth/auth-frame';
import { ForgotPasswordForm } from '@/components/auth/forgot-password-form';

export default function ForgotPasswordScreen() {
  return (
    <AuthFrame
      testID="screen-forgot-password"
      title="Forgot your password?"
      lead="Enter your account's e-mail address and we will send you a link to choose a new password."
    >
      <ForgotPasswordForm />
    </AuthFrame>
  );
}
