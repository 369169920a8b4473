import type { RequestHandler } from 'express';
import helmet from 'helmet';
import type { Config } from '../config.js';

/**
 * Security headers. The CSP allows exactly what the built web app uses: its own scripts, styles
 * and bundled fonts, images from itself plus data: and blob: (photo previews), API calls to itself.
 */
export function securityHeaders(config: Pick<Config, 'appOrigin'>): RequestHandler {
  const https = config.appOrigin.startsWith('https:');
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'"],
        fontSrc: ["'self'", 'data:'],
        imgSrc: ["'self'", 'data:', 'blob:'],
        connectSrc: ["'self'"],
        manifestSrc: ["'self'"],
        workerSrc: ["'self'", 'blob:'],
        objectSrc: ["'none'"],
        baseUri: ["'self'"],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
        scriptSrcAttr: ["'none'"],
        // On plain http (the local demo) upgrading would break every request.
        ...(https ? { upgradeInsecureRequests: [] } : {}),
      },
    },
    strictTransportSecurity: https ? { maxAge: 15552000, includeSubDomains: true } : false,
    crossOriginEmbedderPolicy: false,
    referrerPolicy: { policy: 'same-origin' },
    xFrameOptions: { action: 'deny' },
  });
}
