import { uuid, type SignOutOthersResponse, signedInDevice, signOutOthersResponse } from '@driftmark/shared';
import { Router } from 'express';
import { z } from 'zod';
import { notFound } from '../errors.js';
import { clearSessionCookie } from '../lib/session-cookie.js';
import { sessionEnd } from '../lib/session-lifetime.js';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { validate } from '../middleware/validate.js';
import { authorizeSession } from '../policies/session.policy.js';
import { presentSignedInDevice } from '../presenters/session.presenter.js';
import { SessionRepository } from '../repositories/session.repository.js';
import { SessionService } from '../services/session.service.js';
import { responds } from '../middleware/responds.js';

const sessionParams = z.object({ id: uuid });

/** The signed-in user's own devices under /api/me/sessions: list, sign out one, sign out the others. */
export function meSessionsRouter(): Router {
  const router = Router();

  router.get(
    '/sessions',
    responds({ summary: 'The user’s signed-in devices', data: z.array(signedInDevice) }),
    authenticate(),
    async (req, res) => {
      const { user, sessionId } = requireAuth(req);
      const now = req.ctx.clock();
      const sessions = await new SessionService(req.ctx.dataSource.manager, req.ctx.config).listLive(
        user,
        now,
      );
      // This device first, then the others by last seen (the service's order).
      const ordered = [
        ...sessions.filter((s) => s.id === sessionId),
        ...sessions.filter((s) => s.id !== sessionId),
      ];
      res.json({
        data: ordered.map((s) =>
          presentSignedInDevice(s, sessionEnd(s, user.role, req.ctx.config), sessionId),
        ),
      });
    },
  );

  // Signing out the device making the request is allowed too: it is a sign-out from here.
  router.delete(
    '/sessions/:id',
    responds({ summary: 'Sign out one of the user’s devices', status: 204, data: null }),
    authenticate(),
    validate({ params: sessionParams }),
    async (req, res) => {
      const { actor, user, sessionId } = requireAuth(req);
      const { dataSource, config } = req.ctx;
      const session = await new SessionRepository(dataSource.manager).findById(req.params.id);
      if (!session) throw notFound();
      authorizeSession(actor, 'revoke', session);
      await new SessionService(dataSource.manager, config).revokeOwn(user, session, req.ctx.clock());
      if (session.id === sessionId) clearSessionCookie(res, config);
      res.status(204).end();
    },
  );

  router.post(
    '/sessions/sign-out-others',
    responds({ summary: 'Sign out every other device', data: signOutOthersResponse }),
    authenticate(),
    async (req, res) => {
      const { user, sessionId } = requireAuth(req);
      const signedOut = await new SessionService(req.ctx.dataSource.manager, req.ctx.config).revokeOthers(
        user,
        sessionId,
        req.ctx.clock(),
      );
      res.json({ data: { signedOut } satisfies SignOutOthersResponse });
    },
  );

  return router;
}
