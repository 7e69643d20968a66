import { useMutation, useQueryClient } from '@tanstack/react-query';
import { authClient } from '@/lib/auth-client';
import type { ClinicianSignUp, ForgotPassword, ResetPassword, SignIn } from '@/shared/schemas/auth';
import { meKeys } from './use-me';

export function useSignInMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SignIn) => {
      await authClient.signInEmail(input, 'That e-mail and password do not match an account.');
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: meKeys.all }),
  });
}

export function useSignUpMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: ClinicianSignUp) => {
      await authClient.signUpEmail(input, 'We could not create the account.');
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: meKeys.all }),
  });
}

/** Signs out here, or everywhere: every session of the account ends (a lost phone, a shared computer). */
export function useSignOutMutation(everywhere = false) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => {
      if (everywhere) await authClient.revokeSessions('We could not sign you out everywhere.');
      else await authClient.signOut('We could not sign you out.');
    },
    // Nothing from the previous account may stay in memory for the next one.
    onSuccess: () => queryClient.clear(),
  });
}

export function useRequestPasswordResetMutation() {
  return useMutation({
    mutationFn: async (input: ForgotPassword) => {
      await authClient.requestPasswordReset({ email: input.email, redirectTo: '/reset-password' }, 'We could not send the reset e-mail.');
    },
  });
}

export function useResetPasswordMutation() {
  return useMutation({
    mutationFn: async (input: ResetPassword) => {
      await authClient.resetPassword({ newPassword: input.password, token: input.token }, 'This reset link no longer works. Ask for a new one.');
    },
  });
}
