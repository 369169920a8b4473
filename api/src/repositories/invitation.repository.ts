import { IsNull, type EntityManager } from 'typeorm';
import { Invitation } from '../entities/invitation.entity.js';
import type { Team } from '../entities/team.entity.js';
import type { User } from '../entities/user.entity.js';

export type InvitationWithInviter = Invitation & { invitedBy: User };
export type InvitationWithTeam = Invitation & { invitedBy: User; team: Team };

export class InvitationRepository {
  constructor(private readonly manager: EntityManager) {}

  async create(
    input: Pick<
      Invitation,
      'teamId' | 'email' | 'name' | 'role' | 'invitedById' | 'coachId' | 'tokenHash' | 'expiresAt'
    >,
  ): Promise<Invitation> {
    return this.manager.save(
      this.manager.create(Invitation, { ...input, acceptedAt: null, revokedAt: null, acceptedUserId: null }),
    );
  }

  /** A not-yet-accepted, not-revoked invitation of the team (expired ones included). */
  findOpenInTeam(id: string, teamId: string): Promise<InvitationWithInviter | null> {
    return this.manager.findOne(Invitation, {
      where: { id, teamId, acceptedAt: IsNull(), revokedAt: IsNull() },
      relations: { invitedBy: true },
    }) as Promise<InvitationWithInviter | null>;
  }

  findByHash(tokenHash: string): Promise<InvitationWithTeam | null> {
    return this.manager.findOne(Invitation, {
      where: { tokenHash },
      relations: { invitedBy: true, team: true },
    }) as Promise<InvitationWithTeam | null>;
  }

  /** Locks the invitation row until the transaction ends (one accept wins). */
  findByHashForUpdate(tokenHash: string): Promise<Invitation | null> {
    return this.manager
      .createQueryBuilder(Invitation, 'i')
      .where('i.token_hash = :tokenHash', { tokenHash })
      .setLock('pessimistic_write')
      .getOne();
  }

  /** Open invitations of a team, newest first; only those sent by `invitedById` when given. */
  listOpen(teamId: string, invitedById?: string): Promise<InvitationWithInviter[]> {
    return this.manager.find(Invitation, {
      where: {
        teamId,
        acceptedAt: IsNull(),
        revokedAt: IsNull(),
        ...(invitedById ? { invitedById } : {}),
      },
      relations: { invitedBy: true },
      order: { createdAt: 'DESC' },
    }) as Promise<InvitationWithInviter[]>;
  }

  /** Revokes the team's open invitations to an e-mail (a new invitation replaces them). */
  async revokeOpenForEmail(teamId: string, email: string, at: Date): Promise<void> {
    await this.manager.update(
      Invitation,
      { teamId, email, acceptedAt: IsNull(), revokedAt: IsNull() },
      { revokedAt: at },
    );
  }

  async revoke(id: string, at: Date): Promise<void> {
    await this.manager.update(Invitation, { id, revokedAt: IsNull() }, { revokedAt: at });
  }

  async renew(id: string, tokenHash: string, expiresAt: Date): Promise<void> {
    await this.manager.update(Invitation, { id }, { tokenHash, expiresAt });
  }

  async markAccepted(id: string, userId: string, at: Date): Promise<void> {
    await this.manager.update(Invitation, { id }, { acceptedAt: at, acceptedUserId: userId });
  }
}
