import { z } from 'zod';

export const adminUsersQuerySchema = z.object({
  page: z.coerce.number({ error: 'Expected a page number.' }).int().min(1, { error: 'Pages start at 1.' }).default(1),
  pageSize: z.coerce.number({ error: 'Expected a page size.' }).int().min(1).max(100, { error: 'At most 100 per page.' }).default(25),
  q: z.string().trim().max(254).optional(),
});
export type AdminUsersQuery = z.output<typeof adminUsersQuerySchema>;

export interface AdminUser {
  id: number;
  email: string;
  displayName: string;
  siteRole: 'user' | 'admin';
  clubCount: number;
  createdAt: string;
}

export interface AdminUserPage {
  items: AdminUser[];
  total: number;
  page: number;
  pageSize: number;
}

/** A message caught by the local fake SMTP server. */
export interface CaughtMessage {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
}
