import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ApiError } from '@/lib/api-client';
import { authClient } from '@/lib/auth-client';
import type { ClinicianSignUp, ForgotPassword, ResetPassword, SignIn } from '@/shared/schemas/auth';
import { meKeys } from './use-me';

interface AuthResult {
  error: { status?: number; code?: string; message?: string } | null;
}

/** better-auth answers `{ data, error }`; turn its error into our ApiError so forms treat both alike. */
function unwrap(result: AuthResult, fallback: string): void {
  if (result.error) {
    throw new ApiError(result.error.status ?? 400, result.error.code ?? 'auth_error', result.error.message || fallback);
  }
}

export function useSignInMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SignIn) => {
      // keepalive: the sign-in still completes (and sets its cookie) if the page is left while it runs.
      unwrap(
        await authClient.signIn.email(input, { keepalive: true }),
        'That e-mail and password do not match an account.',
      );
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: meKeys.all }),
  });
}

export function useSignUpMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: ClinicianSignUp) => {
      unwrap(await authClient.signUp.email(input), 'We could not create the account.');
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: meKeys.all }),
  });
}

/** Signs out here, or everywhere: every session of the account ends (a lost phone, a shared computer). */
export function useSignOutMutation(everywhere = false) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => {
      if (everywhere) unwrap(await authClient.revokeSessions(), 'We could not sign you out everywhere.');
      else unwrap(await authClient.signOut(), 'We could not sign you out.');
    },
    // Nothing from the previous account may stay in memory for the next one.
    onSuccess: () => queryClient.clear(),
  });
}

export function useRequestPasswordResetMutation() {
  return useMutation({
    mutationFn: async (input: ForgotPassword) => {
      unwrap(
        await authClient.requestPasswordReset({ email: input.email, redirectTo: '/reset-password' }),
        'We could not send the reset e-mail.',
      );
    },
  });
}

export function useResetPasswordMutation() {
  return useMutation({
    mutationFn: async (input: ResetPassword) => {
      unwrap(
        await authClient.resetPassword({ newPassword: input.password, token: input.token }),
        'This reset link no longer works. Ask for a new one.',
      );
    },
  });
}
