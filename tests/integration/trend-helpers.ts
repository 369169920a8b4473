import {
  trendResponse,
  trendViewFromResponse,
  type PlanBaseline,
  type PlanContent,
  type TrendView,
} from '@driftmark/shared';
import type { DataSource } from 'typeorm';
import { PlanRepository } from '../../api/src/repositories/plan.repository.js';

/**
 * Counts the SQL statements the app sends while `run` is awaited. Every statement TypeORM issues
 * (manager.query, find, save, transactions) goes through the driver's query runner, so wrapping
 * its prototype's `query` sees them all, whichever pooled connection runs them.
 */
export async function countStatements(
  dataSource: DataSource,
  run: () => Promise<unknown>,
): Promise<string[]> {
  const runner = dataSource.createQueryRunner();
  const proto = Object.getPrototypeOf(runner) as { query: (...args: unknown[]) => Promise<unknown> };
  await runner.release();
  const statements: string[] = [];
  const original = proto.query;
  proto.query = function (this: unknown, ...args: unknown[]) {
    statements.push(String(args[0]));
    return original.apply(this, args);
  };
  try {
    await run();
  } finally {
    proto.query = original;
  }
  return statements;
}

/** The factory athlete's figures (female, usual water 2500 mL, usual energy 2100 kcal) at 80 kg. */
export const BASELINE: PlanBaseline = {
  usualWaterMl: 2500,
  usualEnergyKcal: 2100,
  weightKg: 80,
  sex: 'female',
};

/**
 * Saves a plan version directly (the API refuses versions starting before the athlete's today;
 * a test of past days needs one that started earlier, as the demo seed writes them).
 */
export async function insertVersion(
  db: DataSource,
  input: { athleteId: string; coachId: string; effectiveFrom: string; content: PlanContent },
): Promise<void> {
  await new PlanRepository(db.manager).insertVersion({
    athleteId: input.athleteId,
    effectiveFrom: input.effectiveFrom,
    reason: 'Test plan',
    content: input.content,
    baseline: BASELINE,
    createdById: input.coachId,
    acknowledgements: [],
  });
}

/** The calendar date `days` after `date` (YYYY-MM-DD). */
export const shift = (date: string, days: number): string =>
  new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

/** A trend answer's `data` checked against its schema (days as columns) and read back as rows. */
export function readTrend(body: { data: unknown }): TrendView {
  return trendViewFromResponse(trendResponse.strict().parse(body.data));
}
