import { Router } from 'express';
import { limit } from '@/server/middleware/rate-limits';
import { currentUser, requireUser } from '@/server/middleware/auth';
import { route } from '@/server/middleware/validate';
import * as shares from '@/server/services/share-service';
import { startSession } from '@/server/session';
import { bowIdParamSchema, idParamSchema } from '@/shared/common';
import { inviteAcceptSchema, inviteSignUpSchema, inviteTokenParamSchema, shareInviteSchema } from '@/shared/share';

/**
 * Sharing a bow with a technician.
 *   GET  /api/bows/:bowId/shares     the bow's shares (its archer)
 *   POST /api/bows/:bowId/shares     {email} invite; e-mails a 7-day single-use link
 *   GET  /api/shares                 every open share of the archer's bows
 *   POST /api/shares/:id/revoke      end a share at once
 *   GET  /api/invites/:token         what an invitation is for (no sign-in)
 *   POST /api/invites/accept         {token} accept, signed in as a technician
 *   POST /api/invites/accept-new     {token, name, email, password} new technician account + accept
 */
export function shareRoutes() {
  const router = Router();
  // Invitations per inviting account; new accounts share the sign-up limit (server/middleware/rate-limits.ts).
  router.get(
    '/bows/:bowId/shares',
    requireUser,
    route({ params: bowIdParamSchema }, async (req, res) => {
      res.json({ shares: await shares.listBowShares(currentUser(req), req.params.bowId) });
    }),
  );
  router.post(
    '/bows/:bowId/shares',
    requireUser,
    limit('invite'),
    route({ params: bowIdParamSchema, body: shareInviteSchema }, async (req, res) => {
      res.status(201).json({ share: await shares.inviteTech(currentUser(req), req.params.bowId, req.body.email) });
    }),
  );
  router.get('/shares', requireUser, async (req, res) => {
    res.json({ shares: await shares.listMyShares(currentUser(req)) });
  });
  router.post(
    '/shares/:id/revoke',
    requireUser,
    route({ params: idParamSchema }, async (req, res) => {
      res.json({ share: await shares.revokeShare(currentUser(req), req.params.id) });
    }),
  );
  router.get(
    '/invites/:token',
    route({ params: inviteTokenParamSchema }, async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.json({ invite: await shares.previewInvite(req.params.token) });
    }),
  );
  router.post(
    '/invites/accept',
    requireUser,
    route({ body: inviteAcceptSchema }, async (req, res) => {
      res.json({ share: await shares.acceptInvite(currentUser(req), req.body.token) });
    }),
  );
  router.post(
    '/invites/accept-new',
    limit('signUp'),
    route({ body: inviteSignUpSchema }, async (req, res) => {
      const { user, share } = await shares.acceptWithNewAccount(req.body);
      await startSession(req, user.id);
      res.status(201).json({ user: user.toPublic(), share });
    }),
  );
  return router;
}
