import {
  changePasswordRequest,
  forgotPasswordRequest,
  resetPasswordRequest,
  signInRequest,
  meResponse,
  okResponse,
} from '@driftmark/shared';
import { Router } from 'express';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import type { RateLimits } from '../middleware/rate-limit.js';
import { validate } from '../middleware/validate.js';
import { clearSessionCookie, setSessionCookie } from '../lib/session-cookie.js';
import { SESSION_COOKIE } from '../lib/session-token.js';
import { AuthService } from '../services/auth.service.js';
import { SessionService } from '../services/session.service.js';
import { clientInfo } from '../lib/client-info.js';
import { responds } from '../middleware/responds.js';

export function authRouter(limits: RateLimits): Router {
  const router = Router();
  const forgotLimit = limits.reset('forgot');
  const resetLimit = limits.reset('reset');

  router.post(
    '/sign-in',
    responds({ summary: 'Sign in: sets the session cookie', data: meResponse }),
    limits.perAddress('sign-in'),
    limits.signIn(),
    validate({ body: signInRequest }),
    async (req, res) => {
      const { me, token } = await new AuthService(req.ctx).signIn(req.body, clientInfo(req));
      setSessionCookie(res, req.ctx.config, token);
      res.json({ data: me });
    },
  );

  // Works with or without a live session, so a stale tab can always sign out.
  router.post(
    '/sign-out',
    responds({ summary: 'Sign out (with or without a live session)', status: 204, data: null }),
    async (req, res) => {
      const { config: cfg, dataSource } = req.ctx;
      const cookie: unknown = req.cookies?.[SESSION_COOKIE];
      if (typeof cookie === 'string' && cookie !== '') {
        const resolved = await new SessionService(dataSource.manager, cfg).resolve(cookie, req.ctx.clock());
        if ('session' in resolved) await new AuthService(req.ctx).signOut(resolved.session.id);
      }
      clearSessionCookie(res, cfg);
      res.status(204).end();
    },
  );

  router.post(
    '/forgot-password',
    responds({
      summary: 'E-mail a reset link (answers the same whether the address is known)',
      status: 202,
      data: okResponse,
    }),
    forgotLimit,
    validate({ body: forgotPasswordRequest }),
    async (req, res) => {
      await new AuthService(req.ctx).requestPasswordReset(req.body.email);
      res.status(202).json({ data: { ok: true } });
    },
  );

  router.post(
    '/reset-password',
    responds({ summary: 'Set a new password with a reset link’s token', data: okResponse }),
    limits.perAddress('reset-password'),
    resetLimit,
    validate({ body: resetPasswordRequest }),
    async (req, res) => {
      await new AuthService(req.ctx).resetPassword(req.body.token, req.body.password);
      res.json({ data: { ok: true } });
    },
  );

  router.post(
    '/change-password',
    responds({ summary: 'Change the password; other sessions end', data: meResponse }),
    authenticate(),
    validate({ body: changePasswordRequest }),
    async (req, res) => {
      const auth = requireAuth(req);
      const { me, token } = await new AuthService(req.ctx).changePassword(
        auth.user.id,
        auth.sessionId,
        req.body,
      );
      setSessionCookie(res, req.ctx.config, token);
      res.json({ data: me });
    },
  );

  return router;
}
