import { z } from 'zod';
import { RolesSchema } from './roles.js';

const email = z.email({ message: 'Enter a valid e-mail address, like name@example.org.' }).trim().toLowerCase();
/** bcrypt reads only a password's first 72 bytes: a longer one is refused rather than silently cut. */
export const PASSWORD_MAX_BYTES = 72;
/** UTF-8 length of the text (types has no TextEncoder: it runs in the browser and in Node alike). */
function utf8Bytes(text: string): number {
  let bytes = 0;
  for (const character of text) {
    const code = character.codePointAt(0) ?? 0;
    bytes += code < 0x80 ? 1 : code < 0x800 ? 2 : code < 0x10000 ? 3 : 4;
  }
  return bytes;
}
const password = z
  .string()
  .min(10, { message: 'Use a password of at least 10 characters.' })
  .refine((value) => utf8Bytes(value) <= PASSWORD_MAX_BYTES, {
    message: `Use a password of at most ${PASSWORD_MAX_BYTES} bytes (72 plain letters or digits; accented letters and symbols count two to four).`,
  });
const personName = z.string().trim().min(1, { message: 'Enter your name.' }).max(120);

export const SignUpSchema = z.object({
  name: personName,
  email,
  password,
  organisationName: z.string().trim().min(2, { message: 'Enter the name of your organisation.' }).max(160),
});
export type SignUp = z.infer<typeof SignUpSchema>;

/** The answer to a sign-up: the same words whether or not the address has an account. */
export const SignUpSentSchema = z.object({ message: z.string() });
export type SignUpSent = z.infer<typeof SignUpSentSchema>;

/** The e-mailed link that finishes a sign-up. */
export const SignUpConfirmSchema = z.object({ token: z.string().min(10, { message: 'The link is incomplete: open it from the e-mail again.' }).max(200) });
export type SignUpConfirm = z.infer<typeof SignUpConfirmSchema>;

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
