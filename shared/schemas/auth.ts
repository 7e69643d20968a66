import { z } from 'zod';

/** Forms and server share these contracts, so a rule is stated once. */
export const EmailSchema = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter a valid e-mail address.' }));

// 10 characters is the common-practice minimum we chose; better-auth enforces it too (server/auth.ts).
export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 128;
export const PasswordSchema = z
  .string({ error: 'Enter a password.' })
  .min(PASSWORD_MIN_LENGTH, { error: `Use at least ${PASSWORD_MIN_LENGTH} characters.` })
  .max(PASSWORD_MAX_LENGTH, { error: `Use at most ${PASSWORD_MAX_LENGTH} characters.` });

export const PersonNameSchema = z
  .string({ error: 'Enter a name.' })
  .trim()
  .min(1, { error: 'Enter a name.' })
  .max(120, { error: 'Keep the name under 120 characters.' })
  // Names travel into e-mail headers and calendar files, where a line break could forge content.
  .regex(/^[^\u0000-\u001f\u007f]*$/, { error: 'Use a name without line breaks or control characters.' });

export const SignInSchema = z.object({
  email: EmailSchema,
  password: z.string().min(1, { error: 'Enter your password.' }),
});
export type SignIn = z.infer<typeof SignInSchema>;

export const ClinicianSignUpSchema = z.object({
  name: PersonNameSchema,
  email: EmailSchema,
  password: PasswordSchema,
});
export type ClinicianSignUp = z.infer<typeof ClinicianSignUpSchema>;

export const ForgotPasswordSchema = z.object({ email: EmailSchema });
export type ForgotPassword = z.infer<typeof ForgotPasswordSchema>;

export const ResetPasswordSchema = z.object({
  token: z.string().min(1, { error: 'This reset link is incomplete.' }),
  password: PasswordSchema,
});
export type ResetPassword = z.infer<typeof ResetPasswordSchema>;
