import type { Request, RequestHandler, Response } from 'express';
import { AppError } from '../errors.js';
import { sendError } from './errors.js';
import { MAX_UPLOAD_BYTES } from './upload.js';

export interface BodyLimits {
  /** Largest JSON (or other non-multipart) body in bytes. */
  jsonBytes: number;
  /** How long a request without a session may take to send its body (sign-in, reset, invitations). */
  anonymousMs: number;
  /** How long a signed-in request may take to send its body (uploads from a slow phone included). */
  signedInMs: number;
}

export const DEFAULT_BODY_LIMITS: BodyLimits = {
  jsonBytes: 100 * 1024,
  anonymousMs: 10_000,
  signedInMs: 120_000,
};

const hasBody = (req: Request) =>
  req.headers['transfer-encoding'] !== undefined || req.headers['content-length'] !== undefined;

const tooLarge = () => new AppError('payload_too_large', 'The request body is too large.');

/** Stops reading the body and answers now; the connection closes after the answer. */
function refuse(req: Request, res: Response, err: AppError): void {
  if (res.headersSent) return;
  res.locals.bodyRefused = true;
  res.setHeader('Connection', 'close');
  req.unpipe();
  req.pause();
  sendError(req, res, err);
}

/**
 * Body limits enforced before and while reading: a Content-Length above the limit is refused with
 * 413 before a byte is read (multipart uploads against the whole upload's limit), and a body that
 * has not arrived within its time (short without a session) is answered 408; either way the
 * connection closes with the answer, so a client cannot hold it by trickling.
 */
export function bodyLimits(limits: BodyLimits = DEFAULT_BODY_LIMITS): RequestHandler {
  return (req, res, next) => {
    if (!hasBody(req)) return next();
    const limit = req.is('multipart/form-data') ? MAX_UPLOAD_BYTES : limits.jsonBytes;
    const declared = Number(req.headers['content-length']);
    if (Number.isFinite(declared) && declared > limit) {
      res.locals.bodyRefused = true;
      res.setHeader('Connection', 'close');
      return next(tooLarge());
    }
    const anonymous = !(req.headers.cookie ?? '').includes('dm_session=');
    const timer = setTimeout(
      () =>
        refuse(
          req,
          res,
          new AppError('request_timeout', 'The request took too long to arrive. Please try again.'),
        ),
      anonymous ? limits.anonymousMs : limits.signedInMs,
    );
    const stop = () => clearTimeout(timer);
    // 'end' and 'close' do not start the stream flowing; the body is left to its reader.
    req.once('end', stop);
    req.once('close', stop);
    res.once('close', stop);
    next();
  };
}

/**
 * `application/json` bodies into `req.body`, counting bytes as they come and stopping at the limit
 * (413, connection closed) rather than reading the rest away. UTF-8 only, no content encodings;
 * an empty body is `{}`, anything but an object or array at the top is refused (as body-parser's
 * strict mode does).
 */
export function jsonBody(limits: Pick<BodyLimits, 'jsonBytes'> = DEFAULT_BODY_LIMITS): RequestHandler {
  return (req, res, next) => {
    if (!hasBody(req) || !req.is('application/json')) return next();
    const charset = /;\s*charset=("?)([^";]+)\1/i.exec(req.headers['content-type'] ?? '')?.[2]?.toLowerCase();
    if (charset && charset !== 'utf-8' && charset !== 'utf8')
      return next(new AppError('unsupported_media_type', 'The request body uses an unsupported encoding.'));
    const encoding = (req.headers['content-encoding'] ?? 'identity').toLowerCase();
    if (encoding !== 'identity')
      return next(new AppError('unsupported_media_type', 'The request body uses an unsupported encoding.'));

    const chunks: Buffer[] = [];
    let size = 0;
    let done = false;
    const finish = (err?: AppError) => {
      if (done) return;
      done = true;
      req.off('data', onData);
      req.off('end', onEnd);
      req.off('aborted', onAborted);
      req.off('error', onAborted);
      if (err) {
        if (err.code === 'payload_too_large') return refuse(req, res, err);
        if (res.headersSent) return;
        return next(err);
      }
      if (res.headersSent) return; // answered meanwhile (the body timer)
      const text = Buffer.concat(chunks).toString('utf8');
      if (text.trim() === '') {
        req.body = {};
        return next();
      }
      const first = text.trimStart()[0];
      try {
        if (first !== '{' && first !== '[') throw new Error('not an object or array');
        req.body = JSON.parse(text);
      } catch {
        return next(new AppError('validation_failed', 'The request body is not valid JSON.'));
      }
      next();
    };
    const onData = (chunk: Buffer) => {
      size += chunk.length;
      if (size > limits.jsonBytes) finish(tooLarge());
      else chunks.push(chunk);
    };
    const onEnd = () => finish();
    const onAborted = () =>
      finish(new AppError('validation_failed', 'The request body was cut off before it finished.'));
    req.on('data', onData);
    req.on('end', onEnd);
    req.on('aborted', onAborted);
    req.on('error', onAborted);
  };
}
