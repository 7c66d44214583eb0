import { z } from 'zod';
import { email, text } from './common.js';
import { roles, type AuthTokenKind, type Role } from './enums.js';

/** The header every state-changing API request must carry (CSRF defence). */
export const csrfHeader = { name: 'X-Requested-With', value: 'gridkeep' } as const;

export const passwordMinLength = 8;
export const passwordMaxLength = 128;
/** What the set-password and change-password forms say under the new password. */
export const newPasswordHint = `At least ${passwordMinLength} characters, not built from your name, e-mail address, organisation or “Gridkeep”. A few unrelated words are strong and easy to type on a phone.`;
/**
 * Length rules only. The server also refuses passwords that are easy to guess: common ones and
 * ones built from the account's own words (OWASP ASVS 5.0 6.2.4, 6.2.11), answering 400
 * `weak_password` with the reason on the field.
 */
export const newPassword = z
  .string()
  .min(passwordMinLength, `Use at least ${passwordMinLength} characters.`)
  .max(passwordMaxLength, `Use at most ${passwordMaxLength} characters.`);

export const loginInput = z.object({
  email,
  password: z.string().min(1, 'Enter your password.').max(passwordMaxLength),
});
export type LoginInput = z.infer<typeof loginInput>;

/** The signed-in person (`GET /api/auth/me`, and the answer to signing in). */
export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  clientId: string | null;
  clientName?: string | null;
}

/** `GET /api/auth/session`: who is signed in, or null (signed out is an answer, not an error). */
export interface SessionAnswer {
  user: SessionUser | null;
}

export const changePasswordInput = z.object({
  currentPassword: z.string().min(1, 'Enter your current password.').max(passwordMaxLength),
  newPassword,
});
export type ChangePasswordInput = z.infer<typeof changePasswordInput>;

export const forgotPasswordInput = z.object({ email });
export type ForgotPasswordInput = z.infer<typeof forgotPasswordInput>;

/** Completes an invite or a reset link: the token from the link and the new password. */
export const redeemTokenInput = z.object({
  token: z.string().min(20).max(200),
  password: newPassword,
});
export type RedeemTokenInput = z.infer<typeof redeemTokenInput>;

/** What an invite or reset link is for (`GET /api/auth/tokens/:token`); 404 `link_invalid` once used or expired. */
export interface LinkToken {
  kind: AuthTokenKind;
  email: string;
  name: string;
}

// The users' requests (their responses are in users.ts).
export const inviteUserInput = z
  .object({
    email,
    name: z.string().trim().min(1, 'Required.').max(120),
    role: z.enum(roles),
    clientId: z.uuid().nullable().optional(),
  })
  .refine((v) => (v.role === 'client') === Boolean(v.clientId), {
    message: 'A client user needs an organisation; staff have none.',
    path: ['clientId'],
  });
export type InviteUserInput = z.infer<typeof inviteUserInput>;

export const updateUserInput = z.object({
  name: z.string().trim().min(1, 'Required.').max(120).optional(),
  role: z.enum(roles).optional(),
  clientId: z.uuid().nullable().optional(),
  phone: text(40).optional(),
  disabled: z.boolean().optional(),
});
export type UpdateUserInput = z.infer<typeof updateUserInput>;

/** A message the local SMTP fake received (`GET /api/dev/mailbox`, admins, development only). */
export interface MailboxItem {
  id: string;
  to: string;
  subject: string;
  text: string;
  html?: string | null;
  date: string;
  attachments: { filename: string; contentType: string }[];
}
