/**
 * The dev inbox: reads the messages the local SMTP fake captured (one JSON file per message in
 * MAIL_CAPTURE_DIR). Not authenticated on purpose; app.ts mounts it only outside production and
 * only when MAIL_CAPTURE_DIR is set.
 */
import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import { Router, type Response } from 'express';
import type { Config } from '../config.js';
import { notFound } from '../errors.js';

interface CapturedMail {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
}

/** File base names the fake writes: `<ms>-<random>`; nothing that could leave the folder. */
const ID_PATTERN = /^[A-Za-z0-9-]{1,100}$/;
const LIST_LIMIT = 200;

function stampOf(id: string): number {
  const stamp = Number(id.split('-')[0]);
  return Number.isFinite(stamp) ? stamp : 0;
}

async function listIds(dir: string): Promise<string[]> {
  let names: string[];
  try {
    names = await readdir(dir);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT') return [];
    throw err;
  }
  return names
    .filter((n) => n.endsWith('.json'))
    .map((n) => n.slice(0, -'.json'.length))
    .filter((id) => ID_PATTERN.test(id))
    .sort((a, b) => stampOf(b) - stampOf(a) || (a < b ? 1 : a > b ? -1 : 0));
}

async function readMail(dir: string, id: string): Promise<CapturedMail | null> {
  if (!ID_PATTERN.test(id)) return null;
  try {
    const parsed = JSON.parse(await readFile(path.join(dir, `${id}.json`), 'utf8')) as Partial<CapturedMail>;
    return {
      id,
      receivedAt: String(parsed.receivedAt ?? ''),
      from: String(parsed.from ?? ''),
      to: Array.isArray(parsed.to) ? parsed.to.map(String) : [],
      subject: String(parsed.subject ?? ''),
      text: String(parsed.text ?? ''),
      html: typeof parsed.html === 'string' ? parsed.html : null,
    };
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    if (code === 'ENOENT' || err instanceof SyntaxError) return null;
    throw err;
  }
}

function noStore(res: Response): void {
  res.set('Cache-Control', 'no-store');
}

export function devMailRouter(config: Config): Router {
  const router = Router();
  const dir = config.mailCaptureDir;

  router.get('/', async (_req, res) => {
    const ids = dir ? (await listIds(dir)).slice(0, LIST_LIMIT) : [];
    const mails = await Promise.all(ids.map((id) => readMail(dir as string, id)));
    noStore(res);
    res.json({
      data: mails
        .filter((m): m is CapturedMail => m !== null)
        .map(({ id, receivedAt, to, subject }) => ({ id, receivedAt, to, subject })),
    });
  });

  router.get('/:id', async (req, res) => {
    const mail = dir ? await readMail(dir, req.params.id) : null;
    if (!mail) throw notFound('No such message.');
    noStore(res);
    res.json({ data: mail });
  });

  return router;
}
