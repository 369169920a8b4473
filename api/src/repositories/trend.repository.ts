import type { PlanBaseline, PlanContent, Symptom } from '@driftmark/shared';
import type { EntityManager } from 'typeorm';
import type { FlagKind } from '../entities/athlete-flag.entity.js';
import type { EveningFigures, MealTotals } from '../lib/day-actuals.js';
import type { PlanVersionLike } from '../lib/day-plan.js';
import { TREND_ALPHA } from '../lib/analysis.js';

/** One athlete's window of local dates (inclusive) to load. */
export interface HistoryWindow {
  athleteId: string;
  from: string;
  to: string;
}

export interface WeighInRow {
  date: string;
  kg: number;
  /** When the row was last written (a re-entered weight is news to the review queue). */
  updatedAt: Date;
}

export interface FluidRow {
  date: string;
  time: string;
  volumeMl: number;
  /** Sodium the drink carried, mg; null when unknown. */
  sodiumMg: number | null;
}

export interface SymptomRow {
  id: string;
  date: string;
  time: string;
  symptoms: Symptom[];
  urgent: boolean;
  createdAt: Date;
}

export interface FlagRow {
  id: string;
  date: string;
  kind: FlagKind;
  message: string;
  symptomReportId: string | null;
  createdAt: Date;
}

/** Everything the trend, the roster figures and the review queue compute from, for one athlete. */
export interface AthleteHistory {
  /**
   * The EWMA state after the last weigh-in before the window (Walker, The Hacker's Diet: the trend
   * is all the smoothing carries forward), with that weigh-in itself; null without one.
   */
  before: { date: string; trendKg: number; weighIn: WeighInRow } | null;
  /** Weigh-ins in the window, oldest first. */
  weighIns: WeighInRow[];
  meals: Map<string, MealTotals>;
  /** Every fluid entry in the window with its clock time (cut-off breaches need them). */
  fluids: FluidRow[];
  evenings: Map<string, EveningFigures>;
  symptoms: SymptomRow[];
  /**
   * The plan versions that can be in force on a day from the window's start on: the one in force
   * on its first day and every later one (future ones included), by number.
   */
  versions: PlanVersionLike[];
}

/** The windows as three parallel arrays for `unnest` (one statement whatever the count). */
const WINDOWS = `unnest($1::uuid[], $2::date[], $3::date[]) AS p(athlete_id, from_date, to_date)`;
const params = (windows: readonly HistoryWindow[]) => [
  windows.map((w) => w.athleteId),
  windows.map((w) => w.from),
  windows.map((w) => w.to),
];
/** `params` and the outer dates `inWindows` reads as $4 and $5. */
const boundedParams = (windows: readonly HistoryWindow[]) => [
  ...params(windows),
  windows.reduce((min, w) => (w.from < min ? w.from : min), windows[0]!.from),
  windows.reduce((max, w) => (w.to > max ? w.to : max), windows[0]!.to),
];
/**
 * The rows of `alias` inside the windows. The condition on the athletes' ids and the outer dates
 * ($4 = the earliest `from`, $5 = the latest `to`) is what the (athlete_id, local_date) index
 * answers, so only these athletes' rows near the windows are read (never other teams' rows);
 * the join to the windows then keeps each athlete's own days.
 */
const inWindows = (alias: string) =>
  `JOIN ${WINDOWS} ON p.athlete_id = ${alias}.athlete_id
        WHERE ${alias}.athlete_id = ANY($1::uuid[]) AND ${alias}.local_date BETWEEN $4::date AND $5::date
          AND ${alias}.local_date BETWEEN p.from_date AND p.to_date`;

/**
 * Earlier weigh-ins the trend before a window is summed over (see `weighIns`): 0.9⁴⁰⁰ ≈ 5·10⁻¹⁹,
 * so a weigh-in further back moves a trend of up to 300 kg by less than 2·10⁻¹⁶ kg.
 */
export const BEFORE_TREND_WEIGH_INS = 400;

/** Appends to the list under `key`, creating it. */
function push<K, V>(map: Map<K, V[]>, key: K, value: V): void {
  const list = map.get(key);
  if (list) list.push(value);
  else map.set(key, [value]);
}

/**
 * Batch reads over athletes' days for the trend, the roster and the review queue: each method is
 * ONE statement for any number of athletes (no query per athlete or per day), so a roster of 150
 * athletes with years of history costs what a roster of one does.
 */
export class TrendRepository {
  constructor(private readonly manager: EntityManager) {}

  /** Everything in `AthleteHistory` for each window: six statements. Athletes absent from the result have nothing. */
  async load(windows: readonly HistoryWindow[]): Promise<Map<string, AthleteHistory>> {
    const out = new Map<string, AthleteHistory>();
    if (windows.length === 0) return out;
    for (const w of windows) {
      out.set(w.athleteId, {
        before: null,
        weighIns: [],
        meals: new Map(),
        fluids: [],
        evenings: new Map(),
        symptoms: [],
        versions: [],
      });
    }
    const [weighIns, meals, fluids, evenings, symptoms, versions] = await Promise.all([
      this.weighIns(windows),
      this.meals(windows),
      this.fluids(windows),
      this.evenings(windows),
      this.symptoms(windows),
      this.versions(windows),
    ]);
    for (const [id, h] of out) {
      const w = weighIns.get(id);
      if (w) Object.assign(h, w);
      h.meals = meals.get(id) ?? h.meals;
      h.fluids = fluids.get(id) ?? h.fluids;
      h.evenings = evenings.get(id) ?? h.evenings;
      h.symptoms = symptoms.get(id) ?? h.symptoms;
      h.versions = versions.get(id) ?? h.versions;
    }
    return out;
  }

  /**
   * Weigh-ins in each window, and the trend before it computed in SQL in closed form: with T₁ = W₁
   * and Tᵢ = Tᵢ₋₁ + α(Wᵢ − Tᵢ₋₁) (Walker, The Hacker's Diet), Tₙ = (1−α)ⁿ⁻¹·W₁ + Σᵢ₌₂ⁿ α(1−α)ⁿ⁻ⁱ·Wᵢ.
   * A weigh-in k places before the last weighs (1−α)ᵏ, so only the last BEFORE_TREND_WEIGH_INS
   * earlier weigh-ins are read per athlete through the (athlete_id, local_date) index (public for readers that need only the trend; at most that
   * many rows sorted, in memory; never the rest of the history); what is left out weighs at most 0.9⁴⁰⁰ ≈ 5·10⁻¹⁹ of
   * the trend, below double precision, so the smoothing goes on in memory from Tₙ exactly as if it
   * had started at the first weigh-in. With fewer earlier weigh-ins the oldest one read is W₁.
   */
  async weighIns(
    windows: readonly HistoryWindow[],
  ): Promise<Map<string, Pick<AthleteHistory, 'before' | 'weighIns'>>> {
    type Row = {
      athlete_id: string;
      kind: 'before' | 'point';
      date: string;
      trend_kg: number | null;
      kg: number;
      updated_at: Date;
    };
    const rows = await this.manager.query<Row[]>(
      `SELECT p.athlete_id, 'before' AS kind, b.date, b.trend_kg, b.kg, b.updated_at
         FROM ${WINDOWS}
         CROSS JOIN LATERAL (
           SELECT max(e.local_date)::text AS date,
                  sum(e.weight_kg * CASE WHEN e.k = e.n - 1 AND e.n < $7 THEN power(1 - $6::float8, e.k)
                                         ELSE $6::float8 * power(1 - $6::float8, e.k) END) AS trend_kg,
                  (array_agg(e.weight_kg ORDER BY e.k))[1] AS kg,
                  (array_agg(e.updated_at ORDER BY e.k))[1] AS updated_at
             FROM (SELECT l.local_date, l.weight_kg, l.updated_at,
                          row_number() OVER (ORDER BY l.local_date DESC) - 1 AS k,
                          count(*) OVER () AS n
                     FROM (SELECT w.local_date, w.weight_kg, w.updated_at FROM weigh_ins w
                            WHERE w.athlete_id = p.athlete_id AND w.local_date < p.from_date
                            ORDER BY w.local_date DESC LIMIT $7) l) e
           HAVING count(*) > 0) b
       UNION ALL
       SELECT w.athlete_id, 'point', w.local_date::text, NULL, w.weight_kg, w.updated_at
         FROM weigh_ins w ${inWindows('w')}
       ORDER BY 1, 3`,
      [...boundedParams(windows), TREND_ALPHA, BEFORE_TREND_WEIGH_INS],
    );
    const out = new Map<string, Pick<AthleteHistory, 'before' | 'weighIns'>>();
    for (const r of rows) {
      let entry = out.get(r.athlete_id);
      if (!entry) out.set(r.athlete_id, (entry = { before: null, weighIns: [] }));
      const weighIn = { date: r.date, kg: r.kg, updatedAt: r.updated_at };
      if (r.kind === 'before') entry.before = { date: r.date, trendKg: r.trend_kg ?? r.kg, weighIn };
      else entry.weighIns.push(weighIn);
    }
    return out;
  }

  /** Meal sums per day; sodium stays null when no meal of the day carries it (sum() of nulls). */
  private async meals(windows: readonly HistoryWindow[]): Promise<Map<string, Map<string, MealTotals>>> {
    const rows = await this.manager.query<
      {
        athlete_id: string;
        date: string;
        energy_kcal: number;
        protein_g: number;
        carbohydrate_g: number;
        fat_g: number;
        sodium_mg: number | null;
      }[]
    >(
      `SELECT m.athlete_id, m.local_date::text AS date, sum(m.energy_kcal) AS energy_kcal,
              sum(m.protein_g) AS protein_g, sum(m.carbohydrate_g) AS carbohydrate_g, sum(m.fat_g) AS fat_g,
              sum(m.sodium_mg) AS sodium_mg
         FROM meal_entries m ${inWindows('m')}
        GROUP BY m.athlete_id, m.local_date`,
      boundedParams(windows),
    );
    const out = new Map<string, Map<string, MealTotals>>();
    for (const r of rows) {
      let byDay = out.get(r.athlete_id);
      if (!byDay) out.set(r.athlete_id, (byDay = new Map()));
      byDay.set(r.date, {
        energyKcal: r.energy_kcal,
        proteinG: r.protein_g,
        carbohydrateG: r.carbohydrate_g,
        fatG: r.fat_g,
        sodiumMg: r.sodium_mg,
      });
    }
    return out;
  }

  private async fluids(windows: readonly HistoryWindow[]): Promise<Map<string, FluidRow[]>> {
    const rows = await this.manager.query<
      { athlete_id: string; date: string; time: string; volume_ml: number; sodium_mg: number | null }[]
    >(
      `SELECT f.athlete_id, f.local_date::text AS date, f.local_time AS time, f.volume_ml, f.sodium_mg
         FROM fluid_entries f ${inWindows('f')}
        ORDER BY f.athlete_id, f.local_date, f.local_time`,
      boundedParams(windows),
    );
    const out = new Map<string, FluidRow[]>();
    for (const r of rows)
      push(out, r.athlete_id, { date: r.date, time: r.time, volumeMl: r.volume_ml, sodiumMg: r.sodium_mg });
    return out;
  }

  private async evenings(
    windows: readonly HistoryWindow[],
  ): Promise<Map<string, Map<string, EveningFigures>>> {
    const rows = await this.manager.query<
      { athlete_id: string; date: string; steps: number | null; cardio_minutes: number | null }[]
    >(
      `SELECT e.athlete_id, e.local_date::text AS date, e.steps, e.cardio_minutes
         FROM evening_logs e ${inWindows('e')}`,
      boundedParams(windows),
    );
    const out = new Map<string, Map<string, EveningFigures>>();
    for (const r of rows) {
      let byDay = out.get(r.athlete_id);
      if (!byDay) out.set(r.athlete_id, (byDay = new Map()));
      byDay.set(r.date, { steps: r.steps, cardioMinutes: r.cardio_minutes });
    }
    return out;
  }

  private async symptoms(windows: readonly HistoryWindow[]): Promise<Map<string, SymptomRow[]>> {
    const rows = await this.manager.query<
      {
        athlete_id: string;
        id: string;
        date: string;
        time: string;
        symptoms: Symptom[];
        urgent: boolean;
        created_at: Date;
      }[]
    >(
      `SELECT s.athlete_id, s.id, s.local_date::text AS date, s.local_time AS time, s.symptoms, s.urgent,
              s.created_at
         FROM symptom_reports s ${inWindows('s')}
        ORDER BY s.athlete_id, s.local_date, s.local_time`,
      boundedParams(windows),
    );
    const out = new Map<string, SymptomRow[]>();
    for (const r of rows) {
      push(out, r.athlete_id, {
        id: r.id,
        date: r.date,
        time: r.time,
        symptoms: r.symptoms,
        urgent: r.urgent,
        createdAt: r.created_at,
      });
    }
    return out;
  }

  private async versions(windows: readonly HistoryWindow[]): Promise<Map<string, PlanVersionLike[]>> {
    const rows = await this.manager.query<
      {
        athlete_id: string;
        id: string;
        number: number;
        effective_from: string;
        content: PlanContent;
        baseline: PlanBaseline;
      }[]
    >(
      // The version in force on the window's first day (latest effective_from ≤ it, highest
      // number on a tie), and every version starting after it.
      `SELECT v.athlete_id, v.id, v.number, v.effective_from::text AS effective_from, v.content, v.baseline
         FROM plan_versions v JOIN ${WINDOWS} ON p.athlete_id = v.athlete_id
        WHERE v.effective_from > p.from_date
           OR v.id = (SELECT v2.id FROM plan_versions v2
                       WHERE v2.athlete_id = p.athlete_id AND v2.effective_from <= p.from_date
                       ORDER BY v2.effective_from DESC, v2.number DESC LIMIT 1)
        ORDER BY v.athlete_id, v.number`,
      params(windows),
    );
    const out = new Map<string, PlanVersionLike[]>();
    for (const r of rows) {
      push(out, r.athlete_id, {
        id: r.id,
        number: r.number,
        effectiveFrom: r.effective_from,
        content: r.content,
        baseline: r.baseline,
      });
    }
    return out;
  }

  /** Safety flags (athlete_flags rows) per athlete in each window, oldest first. One statement. */
  async flags(windows: readonly HistoryWindow[]): Promise<Map<string, FlagRow[]>> {
    const out = new Map<string, FlagRow[]>();
    if (windows.length === 0) return out;
    const rows = await this.manager.query<
      {
        athlete_id: string;
        id: string;
        date: string;
        kind: FlagKind;
        message: string;
        symptom_report_id: string | null;
        created_at: Date;
      }[]
    >(
      `SELECT f.athlete_id, f.id, f.local_date::text AS date, f.kind, f.message, f.symptom_report_id, f.created_at
         FROM athlete_flags f ${inWindows('f')}
        ORDER BY f.athlete_id, f.created_at`,
      boundedParams(windows),
    );
    for (const r of rows) {
      push(out, r.athlete_id, {
        id: r.id,
        date: r.date,
        kind: r.kind,
        message: r.message,
        symptomReportId: r.symptom_report_id,
        createdAt: r.created_at,
      });
    }
    return out;
  }

  /**
   * Each athlete's last local date with any check-in entry (weigh-in, fluid, meal, supplement,
   * evening card, symptoms) on or before the window's end. One statement; each max() is an index
   * lookup on (athlete_id, local_date).
   */
  async lastCheckIns(windows: readonly HistoryWindow[]): Promise<Map<string, string>> {
    const out = new Map<string, string>();
    if (windows.length === 0) return out;
    const last = (table: string) =>
      `(SELECT max(t.local_date) FROM ${table} t WHERE t.athlete_id = p.athlete_id AND t.local_date <= p.to_date)`;
    const rows = await this.manager.query<{ athlete_id: string; date: string | null }[]>(
      `SELECT p.athlete_id, GREATEST(${[
        'weigh_ins',
        'fluid_entries',
        'meal_entries',
        'supplement_entries',
        'evening_logs',
        'symptom_reports',
      ]
        .map(last)
        .join(', ')})::text AS date
         FROM ${WINDOWS}`,
      params(windows),
    );
    for (const r of rows) if (r.date) out.set(r.athlete_id, r.date);
    return out;
  }
}
