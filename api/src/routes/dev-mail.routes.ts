/**
 * The demo inbox: reads the messages the local SMTP fake captured (one JSON file per message in
 * MAIL_CAPTURE_DIR). Not authenticated on purpose, so it is fenced twice, the API here and its web
 * page (`/dev/inbox`, middleware/web-app.ts) alike: it exists only in demo mode (set by
 * `npm start` / `npm run dev`) with MAIL_CAPTURE_DIR set (`devInboxEnabled` in
 * middleware/dev-inbox.ts), and it answers only clients on this machine (`loopbackOnly`: the
 * socket's own address; no header can claim it).
 */
import { Router, type Response } from 'express';
import { z } from 'zod';
import { listCapturedIds, readCapturedMail, type CapturedMail } from '../adapters/mail-capture.js';
import type { Config } from '../config.js';
import { notFound } from '../errors.js';
import { loopbackOnly } from '../middleware/dev-inbox.js';
import { responds } from '../middleware/responds.js';

const LIST_LIMIT = 200;

/** A captured message in the list (the description of these demo-only routes). */
const mailSummary = z.object({
  id: z.string(),
  receivedAt: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
});
const capturedMail = mailSummary.extend({
  from: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  messageId: z.string().nullable(),
  listUnsubscribe: z.string().nullable().optional(),
  listUnsubscribePost: z.string().nullable().optional(),
}) satisfies z.ZodType<CapturedMail>;

function noStore(res: Response): void {
  res.set('Cache-Control', 'no-store');
}

export function devMailRouter(config: Config): Router {
  const router = Router();
  const dir = config.mailCaptureDir;

  router.use(loopbackOnly());

  router.get(
    '/',
    responds({ summary: 'Demo inbox: the captured messages, newest first', data: z.array(mailSummary) }),
    async (_req, res) => {
      const ids = dir ? (await listCapturedIds(dir)).slice(0, LIST_LIMIT) : [];
      const mails = await Promise.all(ids.map((id) => readCapturedMail(dir as string, id)));
      noStore(res);
      res.json({
        data: mails
          .filter((m): m is CapturedMail => m !== null)
          .map(({ id, receivedAt, to, subject }) => ({ id, receivedAt, to, subject })),
      });
    },
  );

  router.get(
    '/:id',
    responds({ summary: 'Demo inbox: one captured message', data: capturedMail }),
    async (req, res) => {
      const { id } = req.params;
      const mail = dir && typeof id === 'string' ? await readCapturedMail(dir, id) : null;
      if (!mail) throw notFound('No such message.');
      noStore(res);
      res.json({ data: mail });
    },
  );

  return router;
}
