import { randomUUID } from 'node:crypto';
import {
  DEFAULT_TOLERANCES,
  type DayTargets,
  type PlanContent,
  type TemplateRequest,
} from '@driftmark/shared';
import type { DataSource } from 'typeorm';

/** Every plan table, to show that a refused request changed nothing. */
const TABLES = ['plan_versions', 'guardrail_acknowledgements', 'countdown_templates'] as const;

export async function planRows(db: DataSource): Promise<Record<string, unknown[]>> {
  const out: Record<string, unknown[]> = {};
  for (const table of TABLES) out[table] = await db.query(`SELECT * FROM "${table}" ORDER BY id`);
  out.athletes = await db.query(
    'SELECT id, event_date::text, event_time, event_name, updated_at FROM "athletes" ORDER BY id',
  );
  out.teams = await db.query('SELECT id, settings FROM "teams" ORDER BY id');
  return out;
}

export async function countPlanRows(db: DataSource, table: (typeof TABLES)[number]): Promise<number> {
  const [row] = await db.query<{ n: number }[]>(`SELECT count(*)::int AS n FROM "${table}"`);
  return row?.n ?? 0;
}

/**
 * Targets no guardrail objects to for the factory athlete (female, usual water 2500 mL, usual
 * energy 2100 kcal): above both default floors, sodium above the NASEM 2019 adequate intake of
 * 1500 mg, no cut-off, no load. The grams supply the energy exactly (Atwater 4/4/9: 150·4 +
 * 215·4 + 60·9 = 2000 kcal; FAO 2003 FNP 77), so the shares add up to 100 %.
 */
export function safeTargets(overrides: Partial<DayTargets> = {}): DayTargets {
  return {
    energy: { kind: 'kcal', kcal: 2000 },
    protein: { kind: 'g', g: 150 },
    carbohydrate: { kind: 'g', g: 215 },
    fat: { kind: 'g', g: 60 },
    water: { kind: 'ml', ml: 3000 },
    sodiumMg: 2300,
    fluidCutoff: null,
    steps: 10000,
    cardioMinutes: 20,
    supplements: [],
    note: null,
    ...overrides,
  };
}

/** A training/rest week (Sun rest) with safe targets; `training` and `rest` override each type. */
export function planContent(
  options: {
    training?: Partial<DayTargets>;
    rest?: Partial<DayTargets>;
    dates?: PlanContent['dates'];
    countdown?: PlanContent['countdown'];
  } = {},
): PlanContent {
  return {
    dayTypes: [
      { key: 'training', name: 'Training day', targets: safeTargets(options.training) },
      {
        key: 'rest',
        name: 'Rest day',
        // 150·4 + 190·4 + 60·9 = 1900 kcal.
        targets: safeTargets({
          energy: { kind: 'kcal', kcal: 1900 },
          carbohydrate: { kind: 'g', g: 190 },
          ...options.rest,
        }),
      },
    ],
    weekdays: {
      mon: 'training',
      tue: 'training',
      wed: 'training',
      thu: 'training',
      fri: 'training',
      sat: 'training',
      sun: 'rest',
    },
    dates: options.dates ?? [],
    tolerances: { ...DEFAULT_TOLERANCES },
    countdown: options.countdown ?? null,
  };
}

export const versionBody = (
  effectiveFrom: string,
  content: PlanContent = planContent(),
  overrides: Record<string, unknown> = {},
) => ({ effectiveFrom, reason: 'Starting plan', content, acknowledgedKeys: [], ...overrides });

/**
 * A final-week template of our own invention: E-3 water load at usual water + 1000 mL (common
 * practice, no source), E-2 and E-1 lower sodium and a fluid cut-off on E-1 (each one a guardrail),
 * E-0 the event, E+1 back to usual.
 */
export function templateBody(overrides: Partial<TemplateRequest> = {}): TemplateRequest {
  return {
    name: 'Test show week',
    eventType: 'show',
    description: 'Invented for tests.',
    days: [
      {
        offset: -3,
        label: 'Water load',
        targets: safeTargets({ water: { kind: 'usual_plus', ml: 1000 } }),
      },
      {
        offset: -2,
        label: 'Carbohydrate up',
        // No energy target: the macros alone, so the shares are not judged against one.
        targets: safeTargets({ energy: null, carbohydrate: { kind: 'g_per_kg', perKg: 5 }, sodiumMg: 1800 }),
      },
      {
        offset: -1,
        label: 'Taper',
        targets: safeTargets({ sodiumMg: 1200, fluidCutoff: { time: '18:00', allowanceMl: 250 } }),
      },
      { offset: 0, label: 'Show day', targets: safeTargets() },
      {
        offset: 1,
        label: 'Day after',
        targets: safeTargets({
          energy: { kind: 'usual_times', factor: 1 },
          protein: null,
          carbohydrate: null,
          fat: null,
        }),
      },
    ],
    ...overrides,
  };
}

export const supplement = (item: string, times = ['08:00']) => ({
  id: randomUUID(),
  item,
  dose: 1,
  unit: 'tablet',
  times,
});
