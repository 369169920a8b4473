import type { EntityManager } from 'typeorm';

/** The review queue's "last reviewed" per athlete and reviewer. */
export class AthleteReviewRepository {
  constructor(private readonly manager: EntityManager) {}

  /**
   * Records that `reviewerId` reviewed the athlete at `at`; returns the stored instant. One row per
   * athlete and reviewer: a later review moves it forward, an earlier one (two requests racing)
   * never moves it back.
   */
  async upsertReview(athleteId: string, reviewerId: string, at: Date): Promise<Date> {
    const rows = await this.manager.query<{ reviewed_at: Date }[]>(
      `INSERT INTO "athlete_reviews" ("athlete_id", "reviewer_id", "reviewed_at")
       VALUES ($1, $2, $3)
       ON CONFLICT ("athlete_id", "reviewer_id") DO UPDATE
         SET "reviewed_at" = GREATEST("athlete_reviews"."reviewed_at", EXCLUDED."reviewed_at"),
             "updated_at" = now()
       RETURNING "reviewed_at"`,
      [athleteId, reviewerId, at],
    );
    return rows[0]?.reviewed_at ?? at;
  }

  /** athlete id → when `reviewerId` last reviewed them; athletes never reviewed are absent. One query. */
  async lastReviewedByAthlete(reviewerId: string, athleteIds: string[]): Promise<Map<string, Date>> {
    const map = new Map<string, Date>();
    if (athleteIds.length === 0) return map;
    const rows = await this.manager.query<{ athlete_id: string; reviewed_at: Date }[]>(
      `SELECT "athlete_id", "reviewed_at" FROM "athlete_reviews"
       WHERE "reviewer_id" = $1 AND "athlete_id" = ANY($2::uuid[])`,
      [reviewerId, athleteIds],
    );
    for (const row of rows) map.set(row.athlete_id, row.reviewed_at);
    return map;
  }
}
