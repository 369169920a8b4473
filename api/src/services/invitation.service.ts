import {
  LIMITS,
  type AcceptInvitationRequest,
  type CreateInvitationRequest,
  type InvitationPreview,
  type InvitationSummary,
} from '@driftmark/shared';
import { QueryFailedError, type DataSource, type EntityManager } from 'typeorm';
import type { Config } from '../config.js';
import type { Invitation } from '../entities/invitation.entity.js';
import type { User } from '../entities/user.entity.js';
import { conflict, forbidden, tokenInvalid, validationFailed } from '../errors.js';
import { addDays } from '../lib/dates.js';
import { hashPassword } from '../lib/passwords.js';
import { generateToken, hashToken } from '../lib/tokens.js';
import { renderInvitationMail, renderInvitationToExistingAccountMail } from '../mail/templates.js';
import type { Actor } from '../policies/actor.js';
import { canAssignCoach } from '../policies/invitation.policy.js';
import { presentInvitationPreview, presentInvitationSummary } from '../presenters/invitation.presenter.js';
import { AthleteRepository } from '../repositories/athlete.repository.js';
import { InvitationRepository, type InvitationWithInviter } from '../repositories/invitation.repository.js';
import { TeamRepository } from '../repositories/team.repository.js';
import { UserRepository } from '../repositories/user.repository.js';
import { queueMail } from './mail.service.js';
import type { SignedIn } from './auth.service.js';
import { MeService } from './me.service.js';
import { SessionService, type ClientInfo } from './session.service.js';

const EMAIL_TAKEN = 'This e-mail already has a Driftmark account.';
const INVITATION_INVALID = 'This invitation link is no longer valid. Ask your coach for a new one.';

type InvitationDeps = { dataSource: DataSource; config: Config; clock: () => Date };

const isOpen = (inv: Invitation, now: Date): boolean =>
  !inv.acceptedAt && !inv.revokedAt && inv.expiresAt > now;

function isUniqueViolation(err: unknown): boolean {
  return (
    err instanceof QueryFailedError && (err.driverError as { code?: string } | undefined)?.code === '23505'
  );
}

export class InvitationService {
  constructor(private readonly deps: InvitationDeps) {}

  /**
   * Invites someone to the actor's team (the route has checked the actor may invite this role).
   * Replaces an open invitation to the same address and queues the e-mail in the same transaction.
   */
  async create(actor: Actor, inviter: User, input: CreateInvitationRequest): Promise<InvitationSummary> {
    const { dataSource } = this.deps;
    const users = new UserRepository(dataSource.manager);
    let coachId: string | null = null;
    if (input.coachId !== undefined && input.coachId !== actor.userId) {
      if (input.role !== 'athlete') throw validationFailed({ coachId: 'Only athletes are assigned a coach' });
      if (!canAssignCoach(actor, input.coachId))
        throw forbidden('Only the head coach can assign athletes to another coach.');
      const coach = await users.findInTeam(input.coachId, actor.teamId);
      if (!coach || (coach.role !== 'coach' && coach.role !== 'owner')) {
        throw validationFailed({ coachId: 'Choose a coach of your team' });
      }
      coachId = coach.id;
    }
    // An address that already has an account (in this team or another) gets the same answer and an
    // invitation row like any other, so inviting never reveals who uses the product; its mail says
    // what to do instead of carrying an accept link (queueInvitationMail).

    const team = await new TeamRepository(dataSource.manager).findById(actor.teamId);
    if (!team) throw new Error(`Team ${actor.teamId} not found`);
    const token = generateToken();
    const expiresAt = addDays(new Date(), LIMITS.invitationTtlDays);
    const invitation = await dataSource.transaction(async (manager) => {
      const invitations = new InvitationRepository(manager);
      await invitations.revokeOpenForEmail(actor.teamId, input.email, new Date());
      const created = await invitations.create({
        teamId: actor.teamId,
        email: input.email,
        name: input.name,
        role: input.role,
        invitedById: actor.userId,
        coachId,
        tokenHash: hashToken(token),
        expiresAt,
      });
      await this.queueInvitationMail(manager, created, token, inviter, team.name);
      return created;
    });
    return presentInvitationSummary(invitation, inviter);
  }

  /** Open invitations of the team: all of them for the owner, a coach's own for anyone else. */
  async listOpen(actor: Actor): Promise<InvitationSummary[]> {
    const invitations = new InvitationRepository(this.deps.dataSource.manager);
    const rows = await invitations.listOpen(actor.teamId, actor.role === 'owner' ? undefined : actor.userId);
    return rows.map((inv) => presentInvitationSummary(inv, inv.invitedBy));
  }

  async revoke(invitation: Invitation): Promise<void> {
    await new InvitationRepository(this.deps.dataSource.manager).revoke(invitation.id, new Date());
  }

  /** A new token and a new expiry (the old link stops working), e-mailed again. */
  async resend(invitation: InvitationWithInviter): Promise<InvitationSummary> {
    const { dataSource } = this.deps;
    const team = await new TeamRepository(dataSource.manager).findById(invitation.teamId);
    if (!team) throw new Error(`Team ${invitation.teamId} not found`);
    const token = generateToken();
    const expiresAt = addDays(new Date(), LIMITS.invitationTtlDays);
    await dataSource.transaction(async (manager) => {
      await new InvitationRepository(manager).renew(invitation.id, hashToken(token), expiresAt);
      const renewed = { ...invitation, expiresAt };
      await this.queueInvitationMail(manager, renewed, token, invitation.invitedBy, team.name);
    });
    return presentInvitationSummary({ ...invitation, expiresAt }, invitation.invitedBy);
  }

  /** What the invitee sees before accepting; 410 when the link is unknown, used, revoked or expired. */
  async lookup(token: string): Promise<InvitationPreview> {
    const invitation = await new InvitationRepository(this.deps.dataSource.manager).findByHash(
      hashToken(token),
    );
    if (!invitation || !isOpen(invitation, new Date())) throw tokenInvalid(INVITATION_INVALID);
    return presentInvitationPreview(invitation, invitation.team.name, invitation.invitedBy.name);
  }

  /**
   * Creates the account (and, for an athlete, the athlete record awaiting intake, coached by the
   * invitation's coach or else the inviter), marks the invitation accepted and opens a session —
   * all in one transaction.
   */
  async accept(input: AcceptInvitationRequest, client: ClientInfo): Promise<SignedIn> {
    const { dataSource, config } = this.deps;
    // Cheap checks first: a bogus or spent link costs one indexed read, never a bcrypt hash. The
    // transaction below checks again under a row lock.
    const pending = await new InvitationRepository(dataSource.manager).findByHash(hashToken(input.token));
    if (!pending || !isOpen(pending, new Date())) throw tokenInvalid(INVITATION_INVALID);
    if (await new UserRepository(dataSource.manager).existsByEmail(pending.email))
      throw conflict(`${EMAIL_TAKEN} Sign in instead.`);
    const passwordHash = await hashPassword(input.password);
    const sessions = new SessionService(dataSource.manager, config);
    try {
      return await dataSource.transaction(async (manager) => {
        const invitation = await new InvitationRepository(manager).findByHashForUpdate(
          hashToken(input.token),
        );
        const now = new Date();
        if (!invitation || !isOpen(invitation, now)) throw tokenInvalid(INVITATION_INVALID);
        const users = new UserRepository(manager);
        if (await users.existsByEmail(invitation.email)) throw conflict(`${EMAIL_TAKEN} Sign in instead.`);

        const user = await users.create({
          teamId: invitation.teamId,
          email: invitation.email,
          name: input.name,
          role: invitation.role,
          passwordHash,
        });
        if (invitation.role === 'athlete') {
          await new AthleteRepository(manager).create({
            userId: user.id,
            teamId: invitation.teamId,
            coachId: invitation.coachId ?? invitation.invitedById,
            status: 'intake_pending',
          });
        }
        await new InvitationRepository(manager).markAccepted(invitation.id, user.id, now);
        const { session: _session, ...token } = await sessions.start(
          user,
          client,
          this.deps.clock(),
          manager,
        );
        const me = await new MeService(manager).describe(user, manager);
        return { me, token };
      });
    } catch (err) {
      // Two invitations to one address accepted at the same moment: the unique e-mail index decides.
      if (isUniqueViolation(err)) throw conflict(`${EMAIL_TAKEN} Sign in instead.`);
      throw err;
    }
  }

  private async queueInvitationMail(
    manager: EntityManager,
    invitation: Pick<Invitation, 'email' | 'name' | 'role' | 'expiresAt'>,
    token: string,
    inviter: Pick<User, 'name' | 'timeZone'>,
    teamName: string,
  ): Promise<void> {
    if (await new UserRepository(manager).existsByEmail(invitation.email)) {
      const mail = renderInvitationToExistingAccountMail({
        inviteeName: invitation.name,
        inviterName: inviter.name,
        teamName,
        role: invitation.role,
        signInLink: `${this.deps.config.appOrigin}/sign-in`,
      });
      await queueMail(manager, { kind: 'invitation', to: invitation.email, ...mail });
      return;
    }
    const link = `${this.deps.config.appOrigin}/invite/${encodeURIComponent(token)}`;
    const mail = renderInvitationMail({
      inviteeName: invitation.name,
      inviterName: inviter.name,
      teamName,
      role: invitation.role,
      link,
      expiresAt: invitation.expiresAt,
      timeZone: inviter.timeZone,
    });
    await queueMail(manager, { kind: 'invitation', to: invitation.email, ...mail });
  }
}
