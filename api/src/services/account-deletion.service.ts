import type { DataSource } from 'typeorm';
import { createStorage, type StorageAdapter } from '../adapters/storage.js';
import type { Config } from '../config.js';
import type { User } from '../entities/user.entity.js';
import { notFound, tokenInvalid } from '../errors.js';
import { DELETION_TOKEN_TTL_SECONDS, signDeletionToken, verifyDeletionToken } from '../lib/deletion-token.js';
import type { Logger } from '../logger.js';
import { renderAccountDeletedMail, renderDeletionRequestMail } from '../mail/data-rights-templates.js';
import { AthleteRepository } from '../repositories/athlete.repository.js';
import { UserRepository } from '../repositories/user.repository.js';
import { queueMail } from './mail.service.js';

type DeletionDeps = {
  dataSource: DataSource;
  config: Config;
  logger: Logger;
  clock: () => Date;
  storage?: StorageAdapter;
};

/**
 * An athlete deletes their own account in two steps: a request e-mails a signed, expiring link;
 * confirming with it removes their rows (the athlete row and everything hanging off it cascade; the
 * rows they authored under RESTRICT are removed first) and then their photo files. The team, its
 * staff, templates and other athletes stay as they are.
 */
export class AccountDeletionService {
  private readonly storage: StorageAdapter;

  constructor(private readonly deps: DeletionDeps) {
    this.storage = deps.storage ?? createStorage(deps.config);
  }

  async request(user: User): Promise<void> {
    const { dataSource, config, clock } = this.deps;
    const athlete = await new AthleteRepository(dataSource.manager).findByUserId(user.id);
    if (!athlete) throw notFound('Only an athlete can delete their own account here; ask your team owner.');
    const now = clock();
    const token = signDeletionToken(user.id, config.jwtSecret, now);
    const link = `${config.appOrigin}/account/delete?token=${encodeURIComponent(token)}`;
    const expiresAt = new Date(now.getTime() + DELETION_TOKEN_TTL_SECONDS * 1000);
    const mail = renderDeletionRequestMail({ name: user.name, link, expiresAt, timeZone: user.timeZone });
    await dataSource.transaction((manager) =>
      queueMail(manager, { kind: 'account_deletion_request', to: user.email, ...mail }),
    );
  }

  /** Deletes the account the token names; 410 for a bad, expired or already used token. */
  async confirm(token: string): Promise<void> {
    const { dataSource, config, clock, logger } = this.deps;
    const userId = verifyDeletionToken(token, config.jwtSecret, clock());
    if (!userId) throw tokenInvalid();
    const user = await new UserRepository(dataSource.manager).findById(userId);
    const athlete = user ? await new AthleteRepository(dataSource.manager).findByUserId(user.id) : null;
    if (!user || !athlete) throw tokenInvalid();

    const keys = await dataSource.transaction(async (manager) => {
      const photos = await manager.query<{ thumb_key: string; display_key: string }[]>(
        'SELECT thumb_key, display_key FROM condition_photos WHERE athlete_id = $1',
        [athlete.id],
      );
      // RESTRICT references to the user: replies they wrote (on their own marks, which cascade anyway).
      await manager.query('DELETE FROM mark_replies WHERE author_id = $1', [user.id]);
      // The athlete row cascades to days, entries, photos rows, plans, marks, check-ins, flags, shares.
      await manager.query('DELETE FROM athletes WHERE id = $1', [athlete.id]);
      // The user row cascades to sessions, consents, reset tokens, read states, notification sends.
      await manager.query('DELETE FROM users WHERE id = $1', [user.id]);
      const mail = renderAccountDeletedMail({ name: user.name, link: `${config.appOrigin}/sign-in` });
      await queueMail(manager, { kind: 'account_deleted', to: user.email, ...mail });
      return photos.flatMap((p) => [p.thumb_key, p.display_key]);
    });
    // Files after the rows: a rolled-back transaction never loses a file still referenced.
    for (const key of keys) {
      try {
        await this.storage.delete(key);
      } catch (error) {
        logger.error({ err: error, key }, 'photo file could not be removed after account deletion');
      }
    }
  }
}
