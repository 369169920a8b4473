import type { RosterRow } from '@driftmark/shared';
import type { DataSource } from 'typeorm';
import type { Actor } from '../policies/actor.js';
import { canOnAthlete } from '../policies/athlete.policy.js';
import { compareRosterRows, presentRosterRow } from '../presenters/athlete.presenter.js';
import { AthleteRepository, type RosterScope } from '../repositories/athlete.repository.js';
import { AthleteShareRepository } from '../repositories/athlete-share.repository.js';

type RosterDeps = { dataSource: DataSource };

function scopeFor(actor: Actor): RosterScope | null {
  switch (actor.role) {
    case 'owner':
      return { kind: 'team' };
    case 'coach':
      return { kind: 'coachOrShared', userId: actor.userId };
    case 'assistant':
      return { kind: 'shared', userId: actor.userId };
    case 'athlete':
      return null;
  }
}

export class RosterService {
  constructor(private readonly deps: RosterDeps) {}

  /**
   * The athletes the actor may read, soonest event first. The query narrows by role; the
   * athlete policy then confirms every row, so the two can never disagree silently.
   */
  async list(actor: Actor, now: Date = new Date()): Promise<RosterRow[]> {
    const scope = scopeFor(actor);
    if (!scope) return [];
    const manager = this.deps.dataSource.manager;
    const athletes = await new AthleteRepository(manager).listForRoster(actor.teamId, scope);
    const shares = await new AthleteShareRepository(manager).listUserIdsByAthlete(athletes.map((a) => a.id));
    return athletes
      .filter((a) =>
        canOnAthlete(actor, 'read', {
          userId: a.userId,
          teamId: a.teamId,
          coachId: a.coachId,
          sharedWithUserIds: shares.get(a.id) ?? [],
        }),
      )
      .map((a) => presentRosterRow(a, now))
      .sort(compareRosterRows);
  }
}
