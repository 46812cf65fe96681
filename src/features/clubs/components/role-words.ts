import type { ClubRole } from '@shared/schemas/clubs';

export const roleLabels: Record<ClubRole, string> = { member: 'Member', mentor: 'Mentor', organiser: 'Organiser' };

export const roleWithArticle: Record<ClubRole, string> = { member: 'a member', mentor: 'a mentor', organiser: 'an organiser' };

export const roleHints: Record<ClubRole, string> = {
  member: 'shares brews and recipes with the club',
  mentor: 'reads what members share and comments',
  organiser: 'invites and removes members, names mentors',
};

export function formatDay(iso: string) {
  return new Date(iso).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}
