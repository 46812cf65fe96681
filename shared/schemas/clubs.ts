import { z } from 'zod';
import { idSchema } from './common';
import { clubRoleSchema, displayNameSchema, emailSchema, newPasswordSchema, type ClubRole } from './auth';

export { clubRoleSchema, type ClubRole };

export const clubNameSchema = z
  .string({ error: 'Give the club a name.' })
  .trim()
  .min(2, { error: 'Use at least 2 characters.' })
  .max(120, { error: 'Use at most 120 characters.' });

export const clubDescriptionSchema = z
  .string()
  .trim()
  .max(2000, { error: 'Use at most 2000 characters.' })
  .transform((s) => (s === '' ? null : s));

export const createClubSchema = z.object({
  name: clubNameSchema,
  description: clubDescriptionSchema.optional(),
});
export type CreateClubInput = z.input<typeof createClubSchema>;

export const updateClubSchema = z
  .object({ name: clubNameSchema, description: clubDescriptionSchema })
  .partial()
  .refine((v) => v.name !== undefined || v.description !== undefined, { error: 'Change the name or the description.' });
export type UpdateClubInput = z.input<typeof updateClubSchema>;

export const inviteSchema = z.object({
  email: emailSchema,
  role: clubRoleSchema.default('member'),
});
export type InviteInput = z.input<typeof inviteSchema>;

export const setRoleSchema = z.object({
  role: z.enum(['member', 'mentor', 'organiser'], { error: 'Choose member, mentor or organiser.' }),
});
export type SetRoleInput = z.input<typeof setRoleSchema>;

/** What a newcomer without an account sends with their acceptance; a signed-in brewer sends nothing. */
export const acceptInvitationSchema = z.object({
  displayName: displayNameSchema.optional(),
  password: newPasswordSchema.optional(),
});
/** The form a newcomer fills in on the invitation page. */
export const newcomerSchema = z.object({
  displayName: displayNameSchema,
  password: newPasswordSchema,
});
export type NewcomerInput = z.input<typeof newcomerSchema>;

export const clubParamsSchema = z.object({
  id: idSchema,
});
export const memberParamsSchema = clubParamsSchema.extend({
  userId: idSchema,
});
export const invitationParamsSchema = clubParamsSchema.extend({
  invitationId: idSchema,
});
/** Tokens are 32 random bytes in base64url (43 characters); anything else cannot match. */
export const tokenParamsSchema = z.object({ token: z.string().min(1).max(200) });

// Response shapes, shared by the API and the client.

export interface ClubSummary {
  id: number;
  name: string;
  description: string | null;
  role: ClubRole;
  memberCount: number;
}

export interface ClubMember {
  userId: number;
  displayName: string;
  /** Only organisers (and site admins) see members' addresses. */
  email?: string;
  role: ClubRole;
  joinedAt: string;
}

export interface ClubDetail {
  id: number;
  name: string;
  description: string | null;
  createdAt: string;
  /** Null for a site admin looking at a club they are not in. */
  myRole: ClubRole | null;
  canManage: boolean;
  members: ClubMember[];
}

export interface PendingInvitation {
  id: number;
  email: string;
  role: ClubRole;
  invitedBy: string | null;
  createdAt: string;
  expiresAt: string;
  /** Past its expiry: the link no longer works; sending again makes a new one. */
  expired: boolean;
}

export interface InvitationSent {
  invitation: PendingInvitation;
  /** False when the e-mail could not be sent: the invitation stands, and the organiser can resend. */
  mailSent: boolean;
}

export interface InvitationPreview {
  clubId: number;
  clubName: string;
  inviterName: string | null;
  email: string;
  role: ClubRole;
  expiresAt: string;
  /** Whether an account already exists for the invited address (sign in) or not (sign up). */
  accountExists: boolean;
}
