import { Router } from 'express';
import {
  acceptInvitationSchema,
  clubParamsSchema,
  createClubSchema,
  invitationParamsSchema,
  inviteSchema,
  memberParamsSchema,
  setRoleSchema,
  tokenParamsSchema,
  updateClubSchema,
} from '@shared/schemas/clubs';
import { currentUser, issueSession, loadSessionUser, requireUser, toMe } from '../auth/session';
import type { RouterContext } from '../context';
import { handle } from '../lib/handle';
import { acceptInvitation, inviteToClub, listPendingInvitations, previewInvitation, revokeInvitation } from './invitations';
import { createClub, getClub, leaveClub, listMyClubs, removeMember, setMemberRole, updateClub } from './service';

/** `/api/clubs`: a brewer's clubs, their members and the organisers' invitations. */
export function clubsRouter(ctx: RouterContext) {
  const { db } = ctx;
  const router = Router();
  router.use(requireUser);

  router.get(
    '/',
    handle({}, (_valid, req) => listMyClubs(db, currentUser(req).id)),
  );

  router.post(
    '/',
    handle({ body: createClubSchema }, async ({ body }, req, res) => {
      const actor = currentUser(req);
      const id = await createClub(db, actor, body);
      res.status(201);
      // The creator is an organiser now; reload so the permission check sees it.
      return getClub(db, (await loadSessionUser(db, actor.id))!, id);
    }),
  );

  router.get(
    '/:id',
    handle({ params: clubParamsSchema }, ({ params }, req) => getClub(db, currentUser(req), params.id)),
  );

  router.patch(
    '/:id',
    handle({ params: clubParamsSchema, body: updateClubSchema }, async ({ params, body }, req) => {
      await updateClub(db, currentUser(req), params.id, body);
      return getClub(db, currentUser(req), params.id);
    }),
  );

  router.get(
    '/:id/invitations',
    handle({ params: clubParamsSchema }, ({ params }, req) => listPendingInvitations(db, currentUser(req), params.id)),
  );

  router.post(
    '/:id/invitations',
    ctx.limits.clubInvite,
    handle({ params: clubParamsSchema, body: inviteSchema }, async ({ params, body }, req, res) => {
      const sent = await inviteToClub(ctx, currentUser(req), params.id, body);
      res.status(201);
      return sent;
    }),
  );

  router.delete(
    '/:id/invitations/:invitationId',
    handle({ params: invitationParamsSchema }, async ({ params }, req, res) => {
      await revokeInvitation(db, currentUser(req), params.id, params.invitationId);
      res.status(204).end();
    }),
  );

  router.patch(
    '/:id/members/:userId',
    handle({ params: memberParamsSchema, body: setRoleSchema }, async ({ params, body }, req) => {
      await setMemberRole(db, currentUser(req), params.id, params.userId, body.role);
      // Reloaded: an organiser may have just changed their own role.
      return getClub(db, (await loadSessionUser(db, currentUser(req).id))!, params.id);
    }),
  );

  router.delete(
    '/:id/members/:userId',
    handle({ params: memberParamsSchema }, async ({ params }, req, res) => {
      await removeMember(db, currentUser(req), params.id, params.userId);
      res.status(204).end();
    }),
  );

  router.post(
    '/:id/leave',
    handle({ params: clubParamsSchema }, async ({ params }, req, res) => {
      await leaveClub(db, currentUser(req), params.id);
      res.status(204).end();
    }),
  );

  return router;
}

/** `/api/invitations/:token`: public, because the person invited may have no account yet. */
export function invitationsRouter(ctx: RouterContext) {
  const { db, env } = ctx;
  const router = Router();

  router.get(
    '/:token',
    handle({ params: tokenParamsSchema }, ({ params }) => previewInvitation(db, params.token)),
  );

  router.post(
    '/:token/accept',
    ctx.limits.invitationAccept,
    handle({ params: tokenParamsSchema, body: acceptInvitationSchema }, async ({ params, body }, req, res) => {
      const accepted = await acceptInvitation(db, params.token, req.user, body);
      const user = (await loadSessionUser(db, accepted.userId))!;
      if (accepted.createdAccount) issueSession(res, env, { id: user.id, tokenVersion: 0 });
      return { clubId: accepted.clubId, me: toMe(user) };
    }),
  );

  return router;
}
