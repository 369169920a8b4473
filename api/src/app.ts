import compression from 'compression';
import cookieParser from 'cookie-parser';
import express from 'express';
import type { DataSource } from 'typeorm';
import { statementCount } from './db/data-source.js';
import type { Config } from './config.js';
import type { AppContext } from './context.js';
import { configureNotifications } from './services/notify.service.js';
import { createLogger, type Logger } from './logger.js';
import { bodyLimits, DEFAULT_BODY_LIMITS, jsonBody, type BodyLimits } from './middleware/body.js';
import { originCheck } from './middleware/csrf.js';
import { apiNotFound, errorHandler } from './middleware/errors.js';
import { RateLimits } from './middleware/rate-limit.js';
import { requestLogging } from './middleware/request-logging.js';
import { securityHeaders } from './middleware/security.js';
import { webAppRouter } from './middleware/web-app.js';
import { athletesRouter } from './routes/athletes.routes.js';
import { cutSettingsRouter, cutsRouter } from './routes/cuts.routes.js';
import { bodyCompositionRouter } from './routes/body-composition.routes.js';
import { authRouter } from './routes/auth.routes.js';
import { checkInsRouter } from './routes/check-ins.routes.js';
import { countdownTemplatesRouter } from './routes/countdown-templates.routes.js';
import { dataRouter } from './routes/data.routes.js';
import { devInboxEnabled } from './middleware/dev-inbox.js';
import { devMailRouter } from './routes/dev-mail.routes.js';
import { athleteFoodsRouter, foodsRouter } from './routes/foods.routes.js';
import { healthRouter } from './routes/health.routes.js';
import { invitationsRouter } from './routes/invitations.routes.js';
import { marksRouter } from './routes/marks.routes.js';
import { mealPlansRouter, plannedMealsRouter } from './routes/meal-plans.routes.js';
import { notificationsRouter } from './routes/notifications.routes.js';
import { openApiRouter } from './routes/openapi.routes.js';
import { meDataRouter } from './routes/me-data.routes.js';
import { meSessionsRouter } from './routes/me-sessions.routes.js';
import { meRouter } from './routes/me.routes.js';
import { photosRouter } from './routes/photos.routes.js';
import { plansRouter } from './routes/plans.routes.js';
import { posesRouter } from './routes/poses.routes.js';
import { reviewQueueRouter } from './routes/review-queue.routes.js';
import { rosterRouter } from './routes/roster.routes.js';
import { teamRouter } from './routes/team.routes.js';
import { trendsRouter } from './routes/trends.routes.js';
import { weeklyCheckInsRouter } from './routes/weekly-check-ins.routes.js';

/** Builds the Express app (no listen): the API under /api and, when built, the web app. */
export function createApp(deps: {
  config: Config;
  dataSource: DataSource;
  logger?: Logger;
  /** Where "now" comes from (default: the system clock); tests pass a fixed one. */
  clock?: () => Date;
  /** Body size and time limits (default `DEFAULT_BODY_LIMITS`; tests shorten the times). */
  bodyLimits?: BodyLimits;
}): express.Express {
  const { config, dataSource } = deps;
  const logger = deps.logger ?? createLogger(config.logLevel);
  configureNotifications(config);
  const ctx: AppContext = { config, dataSource, logger, clock: deps.clock ?? (() => new Date()) };

  const app = express();
  app.disable('x-powered-by');
  app.set('etag', false);
  // Path params and query strings are validated per route with zod; keep the query parser simple.
  app.set('query parser', 'simple');
  // Behind a TLS proxy (several instances behind one origin), the client's address comes from
  // X-Forwarded-For, believed only from the hops TRUST_PROXY names; rate limits key on it.
  app.set('trust proxy', config.trustProxy);

  app.use(requestLogging(logger));
  if (config.statementCountHeader) {
    // The statements the process sent between the request's arrival and its answer's headers: the
    // request's own only while requests run one at a time, as `npm run bench` sends them.
    app.use((_req, res, next) => {
      const before = statementCount.total;
      const writeHead = res.writeHead.bind(res) as (...args: unknown[]) => typeof res;
      res.writeHead = ((...args: unknown[]) => {
        if (!res.headersSent) res.setHeader('X-Db-Statements', String(statementCount.total - before));
        return writeHead(...args);
      }) as typeof res.writeHead;
      next();
    });
  }
  app.use((req, _res, next) => {
    req.ctx = ctx;
    next();
  });
  app.use(securityHeaders(config));
  // JSON, CSV and the app's HTML go out compressed when the client accepts it (gzip or deflate;
  // compressible types only, so photos and zips pass through). Built assets are precompressed.
  app.use(compression());
  // Size and time limits before and while reading; JSON (at most 100 kB) read by our own reader so a
  // body over the limit is cut off, not read to its end. Photos go through multipart uploads.
  const bodyLimitsSet = deps.bodyLimits ?? DEFAULT_BODY_LIMITS;
  app.use(bodyLimits(bodyLimitsSet));
  app.use(jsonBody(bodyLimitsSet));
  app.use(cookieParser());
  app.use(originCheck(config));

  // Counters live in PostgreSQL: they survive a restart and hold across instances.
  const limits = new RateLimits(config, dataSource);
  const api = express.Router();
  api.use((_req, res, next) => {
    // API answers are per user; never let a shared cache keep them.
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  api.use('/health', healthRouter());
  // The OpenAPI description of this router (/openapi.json), for staff.
  api.use(openApiRouter());
  api.use('/auth', authRouter(limits));
  api.use('/me', meRouter());
  // The signed-in devices (/me/sessions…).
  api.use('/me', meSessionsRouter());
  // The athlete's data archive (/me/export) and account deletion.
  api.use('/me', meDataRouter(limits));
  api.use('/invitations', invitationsRouter(limits));
  api.use('/roster', rosterRouter());
  api.use('/review-queue', reviewQueueRouter());
  api.use('/team/poses', posesRouter());
  api.use('/team', teamRouter());
  api.use('/team', cutSettingsRouter());
  api.use('/athletes', athletesRouter());
  // An athlete's days and entries (/athletes/:athleteId/days/…, /athletes/:athleteId/fluids/:entryId …).
  api.use('/athletes', checkInsRouter());
  // Logging a planned meal of the day's meal plan (/athletes/:athleteId/days/:date/planned-meals/:mealId).
  api.use('/athletes', plannedMealsRouter());
  // The plan, its versions and countdowns (/athletes/:athleteId/plan…).
  api.use('/athletes', plansRouter());
  // The trend, drift and flags over a range (/athletes/:athleteId/trend).
  api.use('/athletes', trendsRouter());
  // Making weight: the weigh-in's record and the cut plan (/athletes/:athleteId/cut, …/weigh-in, …/cut-plans).
  api.use('/athletes', cutsRouter());
  // Body-composition measurements and estimates (/athletes/:athleteId/body-composition, …/body-measurements).
  api.use('/athletes', bodyCompositionRouter());
  // The days as CSV and the end of the coaching (/athletes/:athleteId/days.csv, …/end-coaching).
  api.use('/athletes', dataRouter());
  api.use('/countdown-templates', countdownTemplatesRouter());
  api.use('/foods', foodsRouter());
  // An athlete's personal foods from a label or a barcode (/athletes/:athleteId/foods…).
  api.use('/athletes', athleteFoodsRouter());
  // Meal-plan quantity fitting (/meal-plans/fit).
  api.use('/meal-plans', mealPlansRouter());
  // Photo uploads and the gallery (/athletes/:athleteId/photos) and single photos (/photos/:photoId).
  api.use(photosRouter());
  // Marks on an athlete's charts (/athletes/:athleteId/marks) and single marks (/marks/:markId…).
  api.use(marksRouter());
  // Weekly check-ins (/athletes/:athleteId/weekly-check-ins…, /weekly-check-ins/:checkInId…), the
  // check-in weekday (/athletes/:athleteId/check-in-day) and the team's questions (/team/check-in-questions).
  api.use(weeklyCheckInsRouter());
  // E-mail preferences (/me/notifications) and unsubscribe links (/unsubscribe).
  api.use(notificationsRouter());
  // The demo inbox: only in demo mode (our own scripts set it), only to clients on this machine.
  if (devInboxEnabled(config)) {
    api.use('/dev/mail', devMailRouter(config));
  }
  api.use(apiNotFound());
  app.use('/api', api);

  const web = webAppRouter(config.webDist, { devInbox: devInboxEnabled(config) });
  if (web) app.use(web);

  app.use(apiNotFound());
  app.use(errorHandler());
  return app;
}
