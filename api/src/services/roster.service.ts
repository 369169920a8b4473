import type { RosterFigures, RosterRow } from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import type { Actor } from '../policies/actor.js';
import { canOnAthlete } from '../policies/athlete.policy.js';
import { compareRosterRows, presentRosterRow } from '../presenters/athlete.presenter.js';
import {
  AthleteRepository,
  type AthleteWithPeople,
  type RosterScope,
} from '../repositories/athlete.repository.js';
import { AthleteShareRepository } from '../repositories/athlete-share.repository.js';
import { loadSnapshots } from './athlete-figures.service.js';

type RosterDeps = { dataSource: DataSource; clock: () => Date };

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

/**
 * The athletes the actor may read (two statements). The query narrows by role; the athlete
 * policy then confirms every row, so the two can never disagree silently. The review queue sees
 * exactly these athletes too.
 */
export async function visibleAthletes(manager: EntityManager, actor: Actor): Promise<AthleteWithPeople[]> {
  const scope = scopeFor(actor);
  if (!scope) return [];
  const athletes = await new AthleteRepository(manager).listForRoster(actor.teamId, scope);
  const shares = await new AthleteShareRepository(manager).listUserIdsByAthlete(athletes.map((a) => a.id));
  return athletes.filter((a) =>
    canOnAthlete(actor, 'read', {
      userId: a.userId,
      teamId: a.teamId,
      coachId: a.coachId,
      sharedWithUserIds: shares.get(a.id) ?? [],
    }),
  );
}

/** Figures for an athlete nothing could be loaded for (kept so a row never lacks its columns). */
const EMPTY_FIGURES: RosterFigures = {
  phase: 'no_plan',
  countdownLabel: null,
  latestWeightKg: null,
  latestWeighInDate: null,
  trendKg: null,
  ratePercentPerWeek: null,
  rateBand: null,
  rateBandNote: null,
  rateVerdict: null,
  adherence7: null,
  lastCheckInDate: null,
  flags: [],
  safetyFlag: false,
  weighInGap: null,
};

export class RosterService {
  constructor(private readonly deps: RosterDeps) {}

  /**
   * The athletes the actor may read, soonest event first, with their figures (trend, rate,
   * adherence, flags) — a constant number of statements (two for the athletes, eight for the
   * figures) however many athletes and however long their history.
   */
  async list(actor: Actor): Promise<RosterRow[]> {
    const manager = this.deps.dataSource.manager;
    const now = this.deps.clock();
    const athletes = await visibleAthletes(manager, actor);
    const snapshots = await loadSnapshots(manager, athletes, now);
    return athletes
      .map((a) => presentRosterRow(a, snapshots.get(a.id)?.figures ?? EMPTY_FIGURES, now))
      .sort(compareRosterRows);
  }
}
