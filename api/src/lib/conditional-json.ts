import { createHash } from 'node:crypto';
import type { Request, Response } from 'express';

/**
 * Sends `payload` as JSON with a weak ETag (a hash of the body, so any change to any figure is a
 * new tag) and answers 304 with no body when the request's If-None-Match already names it. API
 * answers stay `no-store` (nothing lands in a shared or disk cache); the web client keeps the tag
 * and the body it came with in memory and sends the tag back itself.
 */
export function sendConditionalJson(req: Request, res: Response, payload: unknown): void {
  const body = JSON.stringify(payload);
  const tag = `W/"${createHash('sha256').update(body).digest('base64url')}"`;
  res.setHeader('ETag', tag);
  // req.fresh compares If-None-Match with the ETag just set (GET/HEAD with a 2xx only).
  if (req.fresh) {
    res.status(304).end();
    return;
  }
  res.type('application/json').send(body);
}
