import type { GuardrailWarning, PlanBaseline, PlanContent } from '@driftmark/shared';
import { In, type EntityManager } from 'typeorm';
import { Athlete } from '../entities/athlete.entity.js';
import { GuardrailAcknowledgement } from '../entities/guardrail-acknowledgement.entity.js';
import { PlanVersion } from '../entities/plan-version.entity.js';
import type { User } from '../entities/user.entity.js';

/** A version with its author loaded (every view names them). */
export type PlanVersionWithAuthor = PlanVersion & { createdBy: User };
/** An acknowledgement with the coach who gave it. */
export type AcknowledgementWithAuthor = GuardrailAcknowledgement & { acknowledgedBy: User };

export interface NewPlanVersion {
  athleteId: string;
  /** YYYY-MM-DD, the athlete's date. The API refuses past dates; the seed writes history directly. */
  effectiveFrom: string;
  reason: string;
  content: PlanContent;
  baseline: PlanBaseline;
  createdById: string;
  /** Default: now (the database's). The seed passes past instants. */
  createdAt?: Date;
  /** The warnings the author acknowledged: one row each, by the author, at `createdAt`. */
  acknowledgements: readonly GuardrailWarning[];
}

/** An athlete's plan versions and their guardrail acknowledgements. */
export class PlanRepository {
  constructor(private readonly manager: EntityManager) {}

  /**
   * Saves a version with the next number for the athlete and its acknowledgements, in one
   * transaction (the caller's, when it has one). The athlete row is locked first, so two saves at
   * once get consecutive numbers instead of one failing on the unique (athlete_id, number) index.
   */
  async insertVersion(input: NewPlanVersion): Promise<PlanVersion> {
    if (this.manager.queryRunner?.isTransactionActive) return this.insertIn(this.manager, input);
    return this.manager.transaction((manager) => this.insertIn(manager, input));
  }

  private async insertIn(manager: EntityManager, input: NewPlanVersion): Promise<PlanVersion> {
    await manager
      .createQueryBuilder(Athlete, 'a')
      .select('a.id')
      .where('a.id = :id', { id: input.athleteId })
      .setLock('pessimistic_write')
      .getOne();
    const [row] = await manager.query<{ n: number }[]>(
      `SELECT COALESCE(MAX("number"), 0)::int AS n FROM "plan_versions" WHERE "athlete_id" = $1`,
      [input.athleteId],
    );
    const version = await manager.save(
      manager.create(PlanVersion, {
        athleteId: input.athleteId,
        number: (row?.n ?? 0) + 1,
        effectiveFrom: input.effectiveFrom,
        reason: input.reason,
        content: input.content,
        baseline: input.baseline,
        createdById: input.createdById,
        ...(input.createdAt ? { createdAt: input.createdAt, updatedAt: input.createdAt } : {}),
      }),
    );
    if (input.acknowledgements.length > 0) {
      const at = input.createdAt ?? version.createdAt;
      await manager.insert(
        GuardrailAcknowledgement,
        input.acknowledgements.map((w) => ({
          planVersionId: version.id,
          athleteId: input.athleteId,
          key: w.key,
          code: w.code,
          severity: w.severity,
          scope: w.scope,
          message: w.message,
          source: w.source,
          acknowledgedById: input.createdById,
          acknowledgedAt: at,
          createdAt: at,
          updatedAt: at,
        })),
      );
    }
    return version;
  }

  /** Every version of the athlete, oldest first (by number), with authors. */
  listForAthlete(athleteId: string): Promise<PlanVersionWithAuthor[]> {
    return this.manager.find(PlanVersion, {
      where: { athleteId },
      relations: { createdBy: true },
      order: { number: 'ASC' },
    }) as Promise<PlanVersionWithAuthor[]>;
  }

  /** Every version of the athlete without authors, oldest first: what the day view picks from. */
  listVersions(athleteId: string): Promise<PlanVersion[]> {
    return this.manager.find(PlanVersion, { where: { athleteId }, order: { number: 'ASC' } });
  }

  /** The newest version (highest number), which may start in the future. */
  findLatest(athleteId: string): Promise<PlanVersionWithAuthor | null> {
    return this.manager.findOne(PlanVersion, {
      where: { athleteId },
      relations: { createdBy: true },
      order: { number: 'DESC' },
    }) as Promise<PlanVersionWithAuthor | null>;
  }

  /** The athlete's version with this number, without its author (for comparing contents). */
  /** Whether `id` names one of the athlete's plan versions. */
  versionExists(athleteId: string, id: string): Promise<boolean> {
    return this.manager.exists(PlanVersion, { where: { id, athleteId } });
  }

  findByNumber(athleteId: string, number: number): Promise<PlanVersion | null> {
    return this.manager.findOneBy(PlanVersion, { athleteId, number });
  }

  /** One version of this athlete (null when the id names another athlete's version or none). */
  findForAthlete(athleteId: string, id: string): Promise<PlanVersionWithAuthor | null> {
    return this.manager.findOne(PlanVersion, {
      where: { id, athleteId },
      relations: { createdBy: true },
    }) as Promise<PlanVersionWithAuthor | null>;
  }

  /** The acknowledgements of these versions, by version id (each list by key). */
  async acknowledgementsByVersion(
    versionIds: readonly string[],
  ): Promise<Map<string, AcknowledgementWithAuthor[]>> {
    const map = new Map<string, AcknowledgementWithAuthor[]>();
    if (versionIds.length === 0) return map;
    const rows = (await this.manager.find(GuardrailAcknowledgement, {
      where: { planVersionId: In([...versionIds]) },
      relations: { acknowledgedBy: true },
      order: { key: 'ASC' },
    })) as AcknowledgementWithAuthor[];
    for (const row of rows) {
      const list = map.get(row.planVersionId) ?? [];
      list.push(row);
      map.set(row.planVersionId, list);
    }
    return map;
  }

  /** How many acknowledgements each version has. */
  async acknowledgementCounts(athleteId: string): Promise<Map<string, number>> {
    const rows = await this.manager.query<{ id: string; n: number }[]>(
      `SELECT "plan_version_id" AS id, count(*)::int AS n FROM "guardrail_acknowledgements"
        WHERE "athlete_id" = $1 GROUP BY "plan_version_id"`,
      [athleteId],
    );
    return new Map(rows.map((r) => [r.id, r.n]));
  }
}
