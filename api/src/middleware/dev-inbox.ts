/**
 * The fence around the demo inbox, its API (routes/dev-mail.routes.ts) and its web page
 * (middleware/web-app.ts) alike: it exists only in demo mode with a capture folder, and it answers
 * only clients on this machine.
 */
import type { RequestHandler } from 'express';
import type { Config } from '../config.js';
import { notFound } from '../errors.js';

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

/** Whether this process has a demo inbox at all (API and web page): demo mode with a capture folder. */
export function devInboxEnabled(config: Pick<Config, 'appMode' | 'mailCaptureDir'>): boolean {
  return config.appMode === 'demo' && Boolean(config.mailCaptureDir);
}

/** Anyone but a client on this machine gets the same 404 as a route that does not exist. */
export function loopbackOnly(message = 'No such API route.'): RequestHandler {
  return (req, _res, next) => {
    next(isLoopbackAddress(req.socket.remoteAddress) ? undefined : notFound(message));
  };
}
