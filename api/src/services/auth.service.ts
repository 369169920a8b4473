import { LIMITS, type ChangePasswordRequest, type Me, type SignInRequest } from '@driftmark/shared';
import type { DataSource } from 'typeorm';
import type { Config } from '../config.js';
import { AppError, notFound, tokenInvalid, validationFailed } from '../errors.js';
import { addMinutes } from '../lib/dates.js';
import { hashPassword, verifyAgainstDummy, verifyPassword } from '../lib/passwords.js';
import { generateToken, hashToken } from '../lib/tokens.js';
import { renderPasswordResetMail } from '../mail/templates.js';
import { PasswordResetTokenRepository } from '../repositories/password-reset-token.repository.js';
import { SessionRepository } from '../repositories/session.repository.js';
import { UserRepository } from '../repositories/user.repository.js';
import { queueMail } from './mail.service.js';
import { MeService } from './me.service.js';
import { SessionService, type ClientInfo, type IssuedToken } from './session.service.js';

const INVALID_CREDENTIALS = 'E-mail or password is incorrect.';
const RESET_INVALID = 'This reset link is no longer valid. Ask for a new one.';

export interface SignedIn {
  me: Me;
  token: IssuedToken;
}

type AuthDeps = { dataSource: DataSource; config: Config; clock: () => Date };

export class AuthService {
  private readonly sessions: SessionService;

  constructor(private readonly deps: AuthDeps) {
    this.sessions = new SessionService(deps.dataSource.manager, deps.config);
  }

  /**
   * Checks the password and opens a session. An unknown e-mail costs the same bcrypt work as a
   * wrong password and gets the same answer, so neither timing nor wording reveals accounts; the
   * work runs in the password pool, off the event loop (lib/passwords.ts).
   */
  async signIn(input: SignInRequest, client: ClientInfo): Promise<SignedIn> {
    const user = await new UserRepository(this.deps.dataSource.manager).findByEmail(input.email);
    const ok = user
      ? await verifyPassword(input.password, user.passwordHash)
      : await verifyAgainstDummy(input.password);
    if (!user || !ok) throw new AppError('invalid_credentials', INVALID_CREDENTIALS);
    const { session: _session, ...token } = await this.sessions.start(user, client, this.deps.clock());
    const me = await new MeService(this.deps.dataSource.manager).describe(user);
    return { me, token };
  }

  async signOut(sessionId: string): Promise<void> {
    await this.sessions.revoke(sessionId, this.deps.clock());
  }

  /**
   * Changes the password, signs out every other session of the user and hands back a fresh
   * token for the current one.
   */
  async changePassword(userId: string, sessionId: string, input: ChangePasswordRequest): Promise<SignedIn> {
    const { dataSource } = this.deps;
    const user = await new UserRepository(dataSource.manager).findById(userId);
    if (!user) throw notFound();
    if (!(await verifyPassword(input.currentPassword, user.passwordHash))) {
      throw validationFailed({ currentPassword: 'The current password is not correct' });
    }
    const passwordHash = await hashPassword(input.newPassword);
    const now = this.deps.clock();
    const session = await dataSource.transaction(async (manager) => {
      await new UserRepository(manager).update(userId, { passwordHash, passwordChangedAt: now });
      await new SessionRepository(manager).revokeAllForUser(userId, { exceptId: sessionId, at: now });
      return new SessionRepository(manager).findById(sessionId);
    });
    if (!session) throw notFound();
    const me = await new MeService(dataSource.manager).get(userId);
    return { me, token: this.sessions.issue(session, user.role, now) };
  }

  /**
   * E-mails a single-use reset link when an account has this address; does nothing otherwise.
   * The caller answers 202 either way.
   */
  async requestPasswordReset(email: string): Promise<void> {
    const { dataSource, config } = this.deps;
    const user = await new UserRepository(dataSource.manager).findByEmail(email);
    if (!user) return;
    const token = generateToken();
    const expiresAt = addMinutes(new Date(), LIMITS.resetTokenTtlMinutes);
    const link = `${config.appOrigin}/reset-password?token=${encodeURIComponent(token)}`;
    await dataSource.transaction(async (manager) => {
      await new PasswordResetTokenRepository(manager).create({
        userId: user.id,
        tokenHash: hashToken(token),
        expiresAt,
      });
      const mail = renderPasswordResetMail({ name: user.name, link, expiresAt, timeZone: user.timeZone });
      await queueMail(manager, { kind: 'password_reset', to: user.email, ...mail });
    });
  }

  /** Redeems a reset token once: sets the password and signs out every session of the user. */
  async resetPassword(token: string, password: string): Promise<void> {
    // Cheap check first: a bogus or spent link costs one indexed read, never a bcrypt hash. The
    // transaction below checks again under a row lock.
    const pending = await new PasswordResetTokenRepository(this.deps.dataSource.manager).findByHash(
      hashToken(token),
    );
    if (!pending || pending.usedAt || pending.expiresAt <= new Date()) throw tokenInvalid(RESET_INVALID);
    const passwordHash = await hashPassword(password);
    await this.deps.dataSource.transaction(async (manager) => {
      const tokens = new PasswordResetTokenRepository(manager);
      const row = await tokens.findByHashForUpdate(hashToken(token));
      const now = new Date();
      if (!row || row.usedAt || row.expiresAt <= now) throw tokenInvalid(RESET_INVALID);
      await new UserRepository(manager).update(row.userId, { passwordHash, passwordChangedAt: now });
      await tokens.useAllForUser(row.userId, now);
      await new SessionRepository(manager).revokeAllForUser(row.userId, { at: this.deps.clock() });
    });
  }
}
