import { z } from 'zod';
import { RolesSchema } from './roles.js';

const email = z.email({ message: 'Enter a valid e-mail address, like name@example.org.' }).trim().toLowerCase();
const password = z
  .string()
  .min(10, { message: 'Use a password of at least 10 characters.' })
  .max(200, { message: 'Use a password of at most 200 characters.' });
const personName = z.string().trim().min(1, { message: 'Enter your name.' }).max(120);

export const SignUpSchema = z.object({
  name: personName,
  email,
  password,
  organisationName: z.string().trim().min(2, { message: 'Enter the name of your organisation.' }).max(160),
});
export type SignUp = z.infer<typeof SignUpSchema>;

export const SignInSchema = z.object({
  email,
  password: z.string().min(1, { message: 'Enter your password.' }),
});
export type SignIn = z.infer<typeof SignInSchema>;

export const PasswordResetRequestSchema = z.object({ email });
export type PasswordResetRequest = z.infer<typeof PasswordResetRequestSchema>;

export const PasswordResetConfirmSchema = z.object({
  token: z.string().min(10, { message: 'The reset link is incomplete: open the link from the e-mail again.' }),
  password,
});
export type PasswordResetConfirm = z.infer<typeof PasswordResetConfirmSchema>;

export const UserSchema = z.object({ id: z.uuid(), email: z.string(), name: z.string() });
export type User = z.infer<typeof UserSchema>;

export const MembershipSchema = z.object({
  organisationId: z.uuid(),
  organisationName: z.string(),
  roles: RolesSchema,
});
export type Membership = z.infer<typeof MembershipSchema>;

/** What GET /api/auth/session and every sign-in answer with. */
export const SessionSchema = z.object({
  user: UserSchema,
  memberships: z.array(MembershipSchema),
});
export type Session = z.infer<typeof SessionSchema>;

export const CsrfTokenSchema = z.object({ csrfToken: z.string() });
export type CsrfToken = z.infer<typeof CsrfTokenSchema>;
