/**
 * The demo inbox: reads the messages the local SMTP fake captured (one JSON file per message in
 * MAIL_CAPTURE_DIR). Not authenticated on purpose, so it is fenced twice: app.ts mounts it only in
 * demo mode (set by `npm start` / `npm run dev`) with MAIL_CAPTURE_DIR set, and it answers only
 * clients on this machine (the socket's own address; no header can claim it).
 */
import { Router, type Response } from 'express';
import { listCapturedIds, readCapturedMail, type CapturedMail } from '../adapters/mail-capture.js';
import type { Config } from '../config.js';
import { notFound } from '../errors.js';

const LIST_LIMIT = 200;

/**
 * True for a loopback peer address: 127.0.0.0/8, ::1, or either written as an IPv4-mapped IPv6
 * address (RFC 4291 §2.4: ::1 is loopback; RFC 1122 §3.2.1.3: 127/8 is loopback; RFC 4291
 * §2.5.5.2: ::ffff:a.b.c.d maps an IPv4 address).
 */
export function isLoopbackAddress(address: string | undefined): boolean {
  if (!address) return false;
  const a = address.toLowerCase();
  if (a === '::1' || a === '0:0:0:0:0:0:0:1') return true;
  const v4 = a.startsWith('::ffff:') ? a.slice('::ffff:'.length) : a;
  return /^127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/.test(v4);
}

function noStore(res: Response): void {
  res.set('Cache-Control', 'no-store');
}

export function devMailRouter(config: Config): Router {
  const router = Router();
  const dir = config.mailCaptureDir;

  // Anyone else gets the same 404 as a route that does not exist.
  router.use((req, _res, next) => {
    next(isLoopbackAddress(req.socket.remoteAddress) ? undefined : notFound('No such API route.'));
  });

  router.get('/', async (_req, res) => {
    const ids = dir ? (await listCapturedIds(dir)).slice(0, LIST_LIMIT) : [];
    const mails = await Promise.all(ids.map((id) => readCapturedMail(dir as string, id)));
    noStore(res);
    res.json({
      data: mails
        .filter((m): m is CapturedMail => m !== null)
        .map(({ id, receivedAt, to, subject }) => ({ id, receivedAt, to, subject })),
    });
  });

  router.get('/:id', async (req, res) => {
    const mail = dir ? await readCapturedMail(dir, req.params.id) : null;
    if (!mail) throw notFound('No such message.');
    noStore(res);
    res.json({ data: mail });
  });

  return router;
}
