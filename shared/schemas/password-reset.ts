import { z } from 'zod';
import { emailSchema, newPasswordSchema } from './auth';

export const passwordResetRequestSchema = z.object({ email: emailSchema });
export type PasswordResetRequestInput = z.input<typeof passwordResetRequestSchema>;

export const passwordResetSchema = z.object({ password: newPasswordSchema });
export type PasswordResetInput = z.input<typeof passwordResetSchema>;

/** The form on the reset page asks twice, so a typo does not lock the brewer out. */
export const passwordResetFormSchema = z
  .object({ password: newPasswordSchema, confirm: z.string({ error: 'Type the password again.' }) })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], error: 'The two passwords differ.' });
export type PasswordResetFormInput = z.input<typeof passwordResetFormSchema>;

/** The same answer whether or not an account exists for the address. */
export const passwordResetRequestedMessage =
  'If an account exists for that address, we have sent it a link to choose a new password. The link works once, for one hour.';

export interface PasswordResetStatus {
  expiresAt: string;
}
