import {
  ageOn,
  BODY_FAT_METHOD_ERROR,
  createBodyMeasurementRequest,
  estimateBodyFat,
  fatAndLeanMass,
  skinfoldSites,
  type BodyCompositionView,
  type BodyMeasurementView,
} from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import type { z } from 'zod';
import { notFound, validationFailed } from '../errors.js';
import { futureEntryProblem, localDateTime } from '../lib/local-time.js';
import type { Actor } from '../policies/actor.js';
import { presentBodyMeasurement } from '../presenters/body-composition.presenter.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import {
  BodyMeasurementRepository,
  type BodyMeasurementWithAuthor,
} from '../repositories/body-measurement.repository.js';
import { TrendRepository } from '../repositories/trend.repository.js';
import { trendCarriedOn } from './trend.service.js';

type Deps = { dataSource: DataSource; clock: () => Date };
type CreateInput = z.output<typeof createBodyMeasurementRequest>;
type Person = Pick<AthleteWithPeople, 'id' | 'sex' | 'birthDate'>;

/** The estimate for a stored row: the athlete's sex and age on the measurement's date decide it. */
function estimateFor(row: BodyMeasurementWithAuthor, athlete: Person) {
  if (!athlete.sex || !athlete.birthDate) return null;
  const r = estimateBodyFat(row, { sex: athlete.sex, ageYears: ageOn(athlete.birthDate, row.localDate) });
  return 'estimate' in r ? r.estimate : null;
}

/**
 * The measurements as the API shows them: each with its estimate and, from the server's trend on
 * the measurement's date (`trendCarriedOn`, the same trend as the charts), fat and lean mass.
 * Two statements whatever the count: the rows, then the weigh-ins of their span.
 */
export async function bodyMeasurementViews(
  manager: EntityManager,
  athlete: Person,
): Promise<BodyMeasurementView[]> {
  const rows = await new BodyMeasurementRepository(manager).listForAthlete(athlete.id);
  if (rows.length === 0) return [];
  const dates = rows.map((r) => r.localDate);
  const history = await new TrendRepository(manager).weighIns([
    { athleteId: athlete.id, from: dates[0]!, to: dates.at(-1)! },
  ]);
  const trendOn = trendCarriedOn(history.get(athlete.id) ?? { before: null, weighIns: [] }, dates);
  return rows.map((row) => {
    const estimate = estimateFor(row, athlete);
    const trendWeightKg = trendOn.get(row.localDate) ?? null;
    const masses =
      estimate && trendWeightKg !== null ? fatAndLeanMass(trendWeightKg, estimate.fatPercent) : null;
    return presentBodyMeasurement(row, {
      estimate,
      trendWeightKg,
      fatMassKg: masses?.fatKg ?? null,
      leanMassKg: masses?.leanKg ?? null,
    });
  });
}

/** The newest measurement on or before `today` that has a lean mass (what lean-mass targets use). */
export function latestLeanMass(
  views: readonly BodyMeasurementView[],
  today: string,
): BodyCompositionView['latestLeanMass'] {
  for (let i = views.length - 1; i >= 0; i--) {
    const v = views[i]!;
    if (v.date <= today && v.leanMassKg !== null)
      return { kg: v.leanMassKg, date: v.date, measurementId: v.id };
  }
  return null;
}

export class BodyCompositionService {
  constructor(private readonly deps: Deps) {}

  private get manager(): EntityManager {
    return this.deps.dataSource.manager;
  }

  async view(athlete: AthleteWithPeople): Promise<BodyCompositionView> {
    const measurements = await bodyMeasurementViews(this.manager, athlete);
    const today = localDateTime(this.deps.clock(), athlete.user.timeZone).date;
    return {
      athleteId: athlete.id,
      measurements,
      latestLeanMass: latestLeanMass(measurements, today),
      caution: BODY_FAT_METHOD_ERROR,
    };
  }

  /**
   * Stores a measurement: refused (400) for a date after the athlete's today, without the sex and
   * birth date the equations need (from the intake), or without the sites and lengths the method
   * needs for this athlete's sex (each missing field named).
   */
  async create(actor: Actor, athlete: AthleteWithPeople, input: CreateInput): Promise<BodyMeasurementView> {
    const problem = futureEntryProblem({ date: input.date }, athlete.user.timeZone, this.deps.clock());
    if (problem) throw validationFailed(problem);
    if (!athlete.sex || (input.method !== 'circumference' && !athlete.birthDate)) {
      throw validationFailed({
        method: "The equations need the athlete's sex and birth date: the athlete completes the intake first",
      });
    }
    const row = {
      method: input.method,
      densityEquation: input.densityEquation,
      // Only the method's own sites are kept; others typed in passing would mislead later readers.
      skinfoldsMm: input.method === 'circumference' ? {} : input.skinfoldsMm,
      neckCm: input.method === 'circumference' ? (input.neckCm ?? null) : null,
      waistCm: input.method === 'circumference' ? (input.waistCm ?? null) : null,
      hipCm: input.method === 'circumference' ? (input.hipCm ?? null) : null,
      heightCm: input.method === 'circumference' ? (input.heightCm ?? null) : null,
    };
    const checked = estimateBodyFat(row, {
      sex: athlete.sex,
      ageYears: athlete.birthDate ? ageOn(athlete.birthDate, input.date) : 0,
    });
    if ('missing' in checked) throw validationFailed(checked.missing);
    if (row.method !== 'circumference') {
      const sites = skinfoldSites(athlete.sex, row.method);
      row.skinfoldsMm = Object.fromEntries(sites.map((s) => [s, input.skinfoldsMm[s]]));
    }
    const repo = new BodyMeasurementRepository(this.manager);
    const id = await repo.insert({
      athleteId: athlete.id,
      localDate: input.date,
      measuredBy: input.measuredBy,
      enteredById: actor.userId,
      ...row,
    });
    const view = (await bodyMeasurementViews(this.manager, athlete)).find((v) => v.id === id);
    if (!view) throw notFound();
    return view;
  }

  async remove(athlete: AthleteWithPeople, measurementId: string): Promise<void> {
    const repo = new BodyMeasurementRepository(this.manager);
    if (!(await repo.findForAthlete(athlete.id, measurementId))) throw notFound();
    await repo.delete(athlete.id, measurementId);
  }
}
