import type { EntityManager } from 'typeorm';

/** Per-day sums for the history list; each map is keyed by local date (YYYY-MM-DD). */
export interface DayAggregates {
  weights: Map<string, number>;
  fluids: Map<string, number>;
  meals: Map<string, { energyKcal: number; proteinG: number; count: number }>;
  evenings: Set<string>;
  symptoms: Map<string, { count: number; urgent: boolean }>;
  supplements: Set<string>;
}

type Range = [athleteId: string, from: string, to: string];
const RANGE = `athlete_id = $1 AND local_date BETWEEN $2 AND $3`;

export class DayHistoryRepository {
  constructor(private readonly manager: EntityManager) {}

  /** Everything logged between two local dates (inclusive), aggregated per day. */
  async aggregate(athleteId: string, from: string, to: string): Promise<DayAggregates> {
    const p: Range = [athleteId, from, to];
    // local_date::text keeps dates as YYYY-MM-DD strings (pg would make them JS Dates).
    const [weights, fluids, meals, evenings, symptoms, supplements] = await Promise.all([
      this.manager.query<{ d: string; kg: number }[]>(
        `SELECT local_date::text AS d, weight_kg AS kg FROM weigh_ins WHERE ${RANGE}`,
        p,
      ),
      this.manager.query<{ d: string; ml: number }[]>(
        `SELECT local_date::text AS d, sum(volume_ml) AS ml FROM fluid_entries WHERE ${RANGE} GROUP BY local_date`,
        p,
      ),
      this.manager.query<{ d: string; kcal: number; protein: number; n: number }[]>(
        `SELECT local_date::text AS d, sum(energy_kcal) AS kcal, sum(protein_g) AS protein, count(*)::int AS n
           FROM meal_entries WHERE ${RANGE} GROUP BY local_date`,
        p,
      ),
      this.manager.query<{ d: string }[]>(`SELECT local_date::text AS d FROM evening_logs WHERE ${RANGE}`, p),
      this.manager.query<{ d: string; n: number; urgent: boolean }[]>(
        `SELECT local_date::text AS d, count(*)::int AS n, bool_or(urgent) AS urgent
           FROM symptom_reports WHERE ${RANGE} GROUP BY local_date`,
        p,
      ),
      this.manager.query<{ d: string }[]>(
        `SELECT DISTINCT local_date::text AS d FROM supplement_entries WHERE ${RANGE}`,
        p,
      ),
    ]);
    return {
      weights: new Map(weights.map((r) => [r.d, r.kg])),
      fluids: new Map(fluids.map((r) => [r.d, r.ml])),
      meals: new Map(meals.map((r) => [r.d, { energyKcal: r.kcal, proteinG: r.protein, count: r.n }])),
      evenings: new Set(evenings.map((r) => r.d)),
      symptoms: new Map(symptoms.map((r) => [r.d, { count: r.n, urgent: r.urgent }])),
      supplements: new Set(supplements.map((r) => r.d)),
    };
  }
}
