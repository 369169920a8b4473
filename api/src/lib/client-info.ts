import type { Request } from 'express';

export interface ClientInfo {
  userAgent: string | null;
  ip: string | null;
}

/** What a session row remembers about the browser that opened it. */
export function clientInfo(req: Pick<Request, 'get' | 'ip'>): ClientInfo {
  return { userAgent: req.get('user-agent') ?? null, ip: req.ip ?? null };
}
