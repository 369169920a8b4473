import type { DataSource } from 'typeorm';
import type { Config } from './config.js';
import type { User } from './entities/user.entity.js';
import type { Logger } from './logger.js';
import type { Actor } from './policies/actor.js';

/** What every request handler can reach: set on `req.ctx` by the first middleware. */
export interface AppContext {
  config: Config;
  dataSource: DataSource;
  logger: Logger;
  /** "Now" for everything that depends on the date or time; tests pin it. */
  clock: () => Date;
}

/** The signed-in user behind a request, set by `authenticate()`. */
export interface RequestAuth {
  actor: Actor;
  user: User;
  sessionId: string;
}

declare global {
  // Express's own extension point for request properties.
  namespace Express {
    interface Request {
      ctx: AppContext;
      auth?: RequestAuth;
    }
  }
}
