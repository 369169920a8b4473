import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';

/** Every check-in table, in the order a snapshot lists them. */
const TABLES = [
  'weigh_ins',
  'fluid_entries',
  'meal_entries',
  'meal_entry_items',
  'supplement_entries',
  'evening_logs',
  'symptom_reports',
  'athlete_flags',
  'foods',
] as const;

/** All check-in rows (and team foods) as plain data, to show that a refused request changed nothing. */
export async function checkInRows(db: DataSource): Promise<Record<string, unknown[]>> {
  const out: Record<string, unknown[]> = {};
  for (const table of TABLES) out[table] = await db.query(`SELECT * FROM "${table}" ORDER BY id`);
  return out;
}

export async function countRows(db: DataSource, table: (typeof TABLES)[number]): Promise<number> {
  const [row] = await db.query<{ n: number }[]>(`SELECT count(*)::int AS n FROM "${table}"`);
  return row?.n ?? 0;
}

export const newId = (): string => randomUUID();

export const weighInBody = (overrides: Record<string, unknown> = {}) => ({
  weight: 72.4,
  unit: 'kg',
  time: '07:10',
  protocolConfirmed: true,
  tags: [],
  ...overrides,
});

export const fluidBody = (overrides: Record<string, unknown> = {}) => ({
  clientId: newId(),
  time: '08:00',
  volume: 500,
  unit: 'ml',
  kind: 'water',
  ...overrides,
});

export const macroMealBody = (overrides: Record<string, unknown> = {}) => ({
  clientId: newId(),
  time: '12:30',
  name: 'Lunch',
  source: 'macros',
  proteinG: 40,
  carbohydrateG: 60,
  fatG: 15,
  ...overrides,
});

/** A meal of one food from the list, by grams. */
export const foodMealBody = (foodId: string, quantityG: number, overrides: Record<string, unknown> = {}) =>
  foodsMealBody([{ foodId, quantityG }], overrides);

/** A meal of foods from the list: each item with grams or portions. */
export const foodsMealBody = (items: Record<string, unknown>[], overrides: Record<string, unknown> = {}) => ({
  clientId: newId(),
  time: '13:00',
  name: 'Snack',
  source: 'foods',
  items,
  ...overrides,
});

export const supplementBody = (overrides: Record<string, unknown> = {}) => ({
  clientId: newId(),
  time: '08:05',
  name: 'Creatine monohydrate',
  dose: 5,
  doseUnit: 'g',
  ...overrides,
});

export const symptomBody = (symptoms: string[], overrides: Record<string, unknown> = {}) => ({
  clientId: newId(),
  time: '10:00',
  symptoms,
  ...overrides,
});

export const eveningBody = (overrides: Record<string, unknown> = {}) => ({
  steps: 9500,
  sleepHours: 7.5,
  cardioMinutes: 30,
  trainingDone: true,
  trainingNote: 'legs',
  ratings: { energy: 4, hunger: 3, mood: 4, sleepQuality: 3, digestion: 5, stress: 2 },
  note: 'Felt fine.',
  ...overrides,
});
