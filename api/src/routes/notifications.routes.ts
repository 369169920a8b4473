import { z } from 'zod';
/**
 * E-mail preferences (GET/PUT /api/me/notifications) and unsubscribe links
 * (GET /api/unsubscribe?token= says what the link stops; POST /api/unsubscribe stops it: the
 * landing page sends `{ token }`, mail clients' RFC 8058 one-click POST carries it in the query).
 */
import {
  NOTIFICATION_LABELS,
  notificationPreferences,
  type NotificationPreferences,
  type UnsubscribeView,
  unsubscribeView,
} from '@driftmark/shared';
import express, { Router, type Request } from 'express';
import type { EntityManager } from 'typeorm';
import { User } from '../entities/user.entity.js';
import { tokenInvalid } from '../errors.js';
import { verifyUnsubscribeToken } from '../lib/unsubscribe-token.js';
import { authenticate, requireAuth } from '../middleware/authenticate.js';
import { validate } from '../middleware/validate.js';
import { kindsForRole, presentPreferences, wants } from '../services/notify.service.js';
import { responds } from '../middleware/responds.js';

async function savePreferences(
  manager: EntityManager,
  user: User,
  input: NotificationPreferences,
): Promise<NotificationPreferences> {
  const current = presentPreferences(user);
  const next = {
    enabled: { ...current.enabled, ...input.enabled },
    reminderHour: user.role === 'athlete' ? (input.reminderHour ?? current.reminderHour) : null,
  };
  await manager.update(User, { id: user.id }, { notificationPrefs: next });
  return presentPreferences({ role: user.role, notificationPrefs: next });
}

function tokenFrom(req: Request): string {
  const body = req.body as { token?: unknown } | undefined;
  const token = typeof body?.token === 'string' ? body.token : req.query.token;
  return typeof token === 'string' ? token : '';
}

async function resolveToken(req: Request): Promise<{ user: User; view: UnsubscribeView }> {
  const claim = verifyUnsubscribeToken(tokenFrom(req), req.ctx.config.jwtSecret);
  const user = claim ? await req.ctx.dataSource.manager.findOneBy(User, { id: claim.userId }) : null;
  if (!claim || !user || !kindsForRole(user.role).includes(claim.kind)) throw tokenInvalid();
  return {
    user,
    view: {
      kind: claim.kind,
      label: NOTIFICATION_LABELS[claim.kind],
      email: user.email,
      done: !wants(user, claim.kind),
    },
  };
}

export function notificationsRouter(): Router {
  const router = Router();

  router.get(
    '/me/notifications',
    responds({ summary: 'E-mail preferences', data: notificationPreferences }),
    authenticate(),
    async (req, res) => {
      const { user } = requireAuth(req);
      const fresh = await req.ctx.dataSource.manager.findOneByOrFail(User, { id: user.id });
      res.json({ data: presentPreferences(fresh) });
    },
  );

  router.put(
    '/me/notifications',
    responds({ summary: 'Replace e-mail preferences', data: notificationPreferences }),
    authenticate(),
    validate({ body: notificationPreferences }),
    async (req, res) => {
      const { user } = requireAuth(req);
      const fresh = await req.ctx.dataSource.manager.findOneByOrFail(User, { id: user.id });
      res.json({ data: await savePreferences(req.ctx.dataSource.manager, fresh, req.body) });
    },
  );

  router.get(
    '/unsubscribe',
    responds({ summary: 'What an unsubscribe link turns off (token in the query)', data: unsubscribeView }),
    async (req, res) => {
      res.json({ data: (await resolveToken(req)).view });
    },
  );

  router.post(
    '/unsubscribe',
    responds({
      summary: 'One-click unsubscribe (RFC 8058; token in the query or form)',
      data: unsubscribeView.extend({ done: z.literal(true) }),
    }),
    express.urlencoded({ extended: false, limit: '4kb' }),
    async (req, res) => {
      const { user, view } = await resolveToken(req);
      if (!view.done) {
        const current = presentPreferences(user);
        await req.ctx.dataSource.manager.update(
          User,
          { id: user.id },
          { notificationPrefs: { ...current, enabled: { ...current.enabled, [view.kind]: false } } },
        );
      }
      res.json({ data: { ...view, done: true } });
    },
  );

  return router;
}
