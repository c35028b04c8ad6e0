import { z } from 'zod';
import { roleSchema, type Role } from './roles';
import { nameText } from './text';

export const PASSWORD_MIN_LENGTH = 12;

export const userInviteSchema = z.object({
  email: z.string().trim().toLowerCase().min(1, 'Enter the person’s e-mail address').email('Enter a valid e-mail address, like name@company.com').max(200),
  name: nameText({ min: 1, minMessage: 'Enter the person’s name as colleagues know it', max: 120, maxMessage: 'Name is 120 characters at most' }),
  role: roleSchema,
});
export type UserInviteInput = z.infer<typeof userInviteSchema>;

/** What an administrator may change on an account: its role, and whether it may sign in. */
export const userUpdateSchema = z
  .object({ role: roleSchema.optional(), active: z.boolean().optional() })
  .refine((v) => v.role !== undefined || v.active !== undefined, { message: 'Send a role or an active flag to change.' });
export type UserUpdateInput = z.infer<typeof userUpdateSchema>;

export const inviteTokenParamSchema = z.object({
  // 32 random bytes, base64url: anything else is not one of our links.
  token: z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'This invitation link is not complete. Open the link from the e-mail again.'),
});

export const newPasswordSchema = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters; a short sentence is easy to remember`)
  .max(200, 'Password is 200 characters at most');

export const inviteAcceptSchema = z.object({ password: newPasswordSchema });
export type InviteAcceptInput = z.infer<typeof inviteAcceptSchema>;

/** The form on the acceptance page: the password twice, so a typo does not lock the person out. */
export const inviteAcceptFormSchema = inviteAcceptSchema
  .extend({ confirmPassword: z.string() })
  .refine((v) => v.password === v.confirmPassword, { message: 'The two passwords differ. Type the same password in both boxes.', path: ['confirmPassword'] });
export type InviteAcceptForm = z.infer<typeof inviteAcceptFormSchema>;

export type AccountStatus = 'active' | 'invited' | 'deactivated';

export interface AdminUser {
  id: number;
  email: string;
  name: string;
  role: Role;
  status: AccountStatus;
  /** The open invitation, when the person has not accepted yet. */
  invite: { sentAt: string; expiresAt: string; expired: boolean } | null;
  createdAt: string;
}

/** What the acceptance page shows before the password is set. */
export interface InvitePreview {
  email: string;
  name: string;
  expiresAt: string;
}
