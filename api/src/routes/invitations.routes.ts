import {
  acceptInvitationRequest,
  createInvitationRequest,
  uuid,
  invitationPreview,
  invitationSummary,
  meResponse,
} from '@driftmark/shared';
import { Router, type Request } from 'express';
import { z } from 'zod';
import { notFound } from '../errors.js';
import { setSessionCookie } from '../lib/session-cookie.js';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import type { RateLimits } from '../middleware/rate-limit.js';
import { requireRole } from '../middleware/require-role.js';
import { validate } from '../middleware/validate.js';
import { authorizeInvitation, type InvitationAction } from '../policies/invitation.policy.js';
import { authorizeTeam } from '../policies/team.policy.js';
import { InvitationRepository } from '../repositories/invitation.repository.js';
import { InvitationService } from '../services/invitation.service.js';
import { clientInfo } from '../lib/client-info.js';
import { responds } from '../middleware/responds.js';

const idParams = z.object({ id: uuid });
const tokenParams = z.object({ token: z.string().min(1).max(200) });
const staff = requireRole('owner', 'coach', 'assistant');

/** Loads an open invitation of the actor's team and checks the actor may act on it. */
async function loadInvitation(req: Request<{ id: string }>, action: InvitationAction) {
  const { actor } = requireAuth(req);
  const invitation = await new InvitationRepository(req.ctx.dataSource.manager).findOpenInTeam(
    req.params.id,
    actor.teamId,
  );
  if (!invitation) throw notFound();
  authorizeInvitation(actor, action, invitation);
  return invitation;
}

export function invitationsRouter(limits: RateLimits): Router {
  const router = Router();

  // Public: what the invitee sees, and accepting (which signs them in). The 256-bit token is
  // the credential and cannot be guessed; accepting is still limited per address, because each
  // attempt with a valid-looking body may cost a bcrypt hash.
  router.get(
    '/lookup/:token',
    responds({ summary: 'What an invitation link is for', data: invitationPreview }),
    validate({ params: tokenParams }),
    async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.json({ data: await new InvitationService(req.ctx).lookup(req.params.token) });
    },
  );

  router.post(
    '/accept',
    responds({
      summary: 'Accept an invitation: creates the account and signs in',
      status: 201,
      data: meResponse,
    }),
    limits.perAddress('invitation-accept'),
    validate({ body: acceptInvitationRequest }),
    async (req, res) => {
      const { me, token } = await new InvitationService(req.ctx).accept(req.body, clientInfo(req));
      setSessionCookie(res, req.ctx.config, token);
      res.status(201).json({ data: me });
    },
  );

  router.post(
    '/',
    responds({ summary: 'Invite someone by e-mail', status: 201, data: invitationSummary }),
    authenticate(),
    staff,
    validate({ body: createInvitationRequest }),
    async (req, res) => {
      const { actor, user } = requireAuth(req);
      authorizeTeam(actor, { kind: 'invite', role: req.body.role }, { id: actor.teamId });
      res.status(201).json({ data: await new InvitationService(req.ctx).create(actor, user, req.body) });
    },
  );

  router.get(
    '/',
    responds({ summary: 'Open invitations', data: z.array(invitationSummary) }),
    authenticate(),
    staff,
    async (req, res) => {
      const { actor } = requireAuth(req);
      res.json({ data: await new InvitationService(req.ctx).listOpen(actor) });
    },
  );

  router.delete(
    '/:id',
    responds({ summary: 'Withdraw an invitation', status: 204, data: null }),
    authenticate(),
    staff,
    validate({ params: idParams }),
    async (req, res) => {
      const invitation = await loadInvitation(req, 'revoke');
      await new InvitationService(req.ctx).revoke(invitation);
      res.status(204).end();
    },
  );

  router.post(
    '/:id/resend',
    responds({ summary: 'Send an invitation again', data: invitationSummary }),
    authenticate(),
    staff,
    validate({ params: idParams }),
    async (req, res) => {
      const invitation = await loadInvitation(req, 'resend');
      res.json({ data: await new InvitationService(req.ctx).resend(invitation) });
    },
  );

  return router;
}
