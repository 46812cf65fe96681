import { describe, expect, it } from 'vitest';
import { can, canDeleteComment, canInClub, canSeeComment, canShareWithClub, requireAccess, requireClubAccess, type Actor, type ResourceAction } from './permissions';
import { Forbidden, NotFound } from '../lib/errors';

// A brew day owned by user 1 and shared with club 10.
const resource = { ownerId: 1, sharedWithClubIds: [10] };
const privateResource = { ownerId: 1, sharedWithClubIds: [] };

const actors: Record<string, Actor | null> = {
  owner: { id: 1, siteRole: 'user', memberships: [{ clubId: 10, role: 'member' }] },
  otherBrewer: { id: 2, siteRole: 'user', memberships: [] },
  clubMember: { id: 3, siteRole: 'user', memberships: [{ clubId: 10, role: 'member' }] },
  mentorOfClub: { id: 4, siteRole: 'user', memberships: [{ clubId: 10, role: 'mentor' }] },
  mentorOfOtherClub: { id: 5, siteRole: 'user', memberships: [{ clubId: 20, role: 'mentor' }] },
  organiser: { id: 6, siteRole: 'user', memberships: [{ clubId: 10, role: 'organiser' }] },
  siteAdmin: { id: 7, siteRole: 'admin', memberships: [] },
  anonymous: null,
};

const actions: ResourceAction[] = ['read', 'clone', 'comment', 'update', 'delete', 'share'];

// Expected outcome per actor, in the order of `actions`. Y = allowed.
const matrix: Record<string, string> = {
  owner: 'YYYYYY',
  otherBrewer: '------',
  clubMember: 'YY----',
  mentorOfClub: 'YYY---',
  mentorOfOtherClub: '------',
  organiser: 'YY----',
  siteAdmin: '------',
  anonymous: '------',
};

describe('who may do what with a shared brewer resource', () => {
  for (const [name, actor] of Object.entries(actors)) {
    it(`${name}: ${matrix[name]}`, () => {
      const got = actions.map((a) => (can(actor, a, resource) ? 'Y' : '-')).join('');
      expect(got).toBe(matrix[name]);
    });
  }

  it('a private resource is visible to its owner only', () => {
    for (const [name, actor] of Object.entries(actors)) {
      expect(can(actor, 'read', privateResource), name).toBe(name === 'owner');
    }
  });

  it('hides what a person may not see (404) and refuses what they may see but not do (403)', () => {
    expect(() => requireAccess(actors.otherBrewer, 'read', resource)).toThrow(NotFound);
    expect(() => requireAccess(actors.clubMember, 'update', resource)).toThrow(Forbidden);
    expect(() => requireAccess(actors.mentorOfClub, 'comment', resource)).not.toThrow();
    expect(() => requireAccess(actors.owner, 'update', null)).toThrow(NotFound);
  });
});

describe('club actions', () => {
  // Order: view, invite, remove-member, set-role, rename, delete, leave.
  it.each([
    ['owner', 'Y-----Y'],
    ['otherBrewer', '-------'],
    ['organiser', 'YYYYYYY'],
    ['mentorOfClub', 'Y-----Y'],
    ['clubMember', 'Y-----Y'],
    ['mentorOfOtherClub', '-------'],
    ['siteAdmin', 'YYYYYY-'],
    ['anonymous', '-------'],
  ])('%s: %s', (name, expected) => {
    const got = (['view', 'invite', 'remove-member', 'set-role', 'rename', 'delete', 'leave'] as const).map((a) => (canInClub(actors[name], a, 10) ? 'Y' : '-')).join('');
    expect(got).toBe(expected);
  });

  it('hides a club from non-members (404) and refuses management to plain members (403)', () => {
    expect(() => requireClubAccess(actors.mentorOfOtherClub, 'view', 10)).toThrow(NotFound);
    expect(() => requireClubAccess(actors.anonymous, 'leave', 10)).toThrow(NotFound);
    expect(() => requireClubAccess(actors.mentorOfClub, 'invite', 10)).toThrow(Forbidden);
    expect(() => requireClubAccess(actors.organiser, 'invite', 10)).not.toThrow();
    expect(() => requireClubAccess(actors.siteAdmin, 'leave', 10)).toThrow(Forbidden);
  });
});

describe('sharing with a club', () => {
  it.each([
    ['owner', 'Y-'],
    ['otherBrewer', '--'],
    ['clubMember', 'Y-'],
    ['mentorOfClub', 'Y-'],
    ['mentorOfOtherClub', '-Y'],
    ['organiser', 'Y-'],
    ['siteAdmin', '--'],
    ['anonymous', '--'],
  ])('%s may share into clubs 10 and 20: %s', (name, expected) => {
    const got = [10, 20].map((clubId) => (canShareWithClub(actors[name], clubId) ? 'Y' : '-')).join('');
    expect(got).toBe(expected);
  });
});

describe('comments on a shared brew day', () => {
  // The brew day (owner 1) is shared with clubs 10 and 30 (not 20). Mentor 4 of club 10 wrote
  // one comment, mentor 8 of club 30 another, and the owner replied.
  const sharedTwice = { ownerId: 1, sharedWithClubIds: [10, 30] };
  const mentorOfSecondClub: Actor = { id: 8, siteRole: 'user', memberships: [{ clubId: 30, role: 'mentor' }] };
  const byMentorOfClub = { authorId: 4, authorClubIds: [10] };
  const byMentorOfSecondClub = { authorId: 8, authorClubIds: [30] };
  const byOwner = { authorId: 1, authorClubIds: [10] };

  it.each([
    // Order: the club-10 mentor's comment, the club-30 mentor's comment, the owner's reply.
    ['owner', 'YYY'],
    ['otherBrewer', '---'],
    ['clubMember', 'Y-Y'],
    ['mentorOfClub', 'Y-Y'],
    ['mentorOfOtherClub', '---'],
    ['organiser', 'Y-Y'],
    ['siteAdmin', '---'],
    ['anonymous', '---'],
  ])('%s sees: %s', (name, expected) => {
    const got = [byMentorOfClub, byMentorOfSecondClub, byOwner].map((c) => (canSeeComment(actors[name], sharedTwice, c) ? 'Y' : '-')).join('');
    expect(got).toBe(expected);
  });

  it('shows the second club’s mentor their own club’s review and the owner’s reply only', () => {
    const got = [byMentorOfClub, byMentorOfSecondClub, byOwner].map((c) => (canSeeComment(mentorOfSecondClub, sharedTwice, c) ? 'Y' : '-')).join('');
    expect(got).toBe('-YY');
  });

  it('hides every comment once the brew day is no longer shared with the reader’s club', () => {
    expect(canSeeComment(actors.mentorOfClub, privateResource, byMentorOfClub)).toBe(false);
    expect(canSeeComment(actors.owner, privateResource, byMentorOfClub)).toBe(true);
  });

  it('lets only the author delete a comment', () => {
    const got = Object.entries(actors).filter(([, a]) => canDeleteComment(a, byMentorOfClub)).map(([name]) => name);
    expect(got).toEqual(['mentorOfClub']);
    expect(canDeleteComment(actors.owner, { authorId: null })).toBe(false);
  });
});
