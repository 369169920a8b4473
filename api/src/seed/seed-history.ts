/**
 * Writes the generated check-in history (history.ts) and the placeholder photos (photos.ts) of the
 * demo athletes. Rows go in as chunked multi-row inserts inside the seed's transaction; photo
 * files go through the images adapter (the same checks and re-encoding an upload gets) and the
 * storage adapter before their rows are written.
 */
import { randomUUID } from 'node:crypto';
import os from 'node:os';
import { RELAXED_POSES, SYMPTOM_LABELS, URGENT_SYMPTOMS, type Symptom } from '@driftmark/shared';
import type { EntityManager, EntityTarget, ObjectLiteral, QueryDeepPartialEntity } from 'typeorm';
import { processPhoto, type ProcessedPhoto } from '../adapters/images.js';
import { newStorageKey, type StorageAdapter } from '../adapters/storage.js';
import { AthleteFlag } from '../entities/athlete-flag.entity.js';
import { ConditionPhoto } from '../entities/condition-photo.entity.js';
import { EveningLog } from '../entities/evening-log.entity.js';
import { FluidEntry } from '../entities/fluid-entry.entity.js';
import { MealEntry } from '../entities/meal-entry.entity.js';
import { SupplementEntry } from '../entities/supplement-entry.entity.js';
import { SymptomReport } from '../entities/symptom-report.entity.js';
import { WeighIn } from '../entities/weigh-in.entity.js';
import { localInstant } from '../lib/local-time.js';
import { localDate } from './calendar.js';
import type { DemoAthleteDefinition } from './demo-team.js';
import { generateHistory, type AthleteHistory } from './history.js';
import { planPhotos, renderPlaceholderPhoto, type PlannedPhoto } from './photos.js';

/** Rows per INSERT: the widest table (meals, 18 columns) stays far below PostgreSQL's 65,535 parameters. */
const CHUNK_ROWS = 1000;

export interface DemoHistoryPlan {
  def: DemoAthleteDefinition;
  history: AthleteHistory;
  photos: PlannedPhoto[];
}

/** Every demo athlete's history, ending the day before `now` in the athlete's own time zone. */
export function planDemoHistory(defs: readonly DemoAthleteDefinition[], now: Date): DemoHistoryPlan[] {
  return defs.map((def) => {
    const history = generateHistory(def, { seedDate: localDate(now, def.timeZone) });
    return { def, history, photos: planPhotos(def, history) };
  });
}

/**
 * Runs `fn` over `items`, at most `limit` at a time, keeping the order. On a failure no new item
 * starts, the running ones finish, and then the first error is thrown (so nothing is still
 * writing while the caller cleans up).
 */
async function mapLimit<T, R>(items: readonly T[], limit: number, fn: (item: T) => Promise<R>): Promise<R[]> {
  const out = new Array<R>(items.length);
  let next = 0;
  let failure: { error: unknown } | null = null;
  const worker = async () => {
    for (let i = next++; i < items.length && !failure; i = next++) {
      try {
        out[i] = await fn(items[i] as T);
      } catch (error) {
        failure ??= { error };
      }
    }
  };
  await Promise.all(Array.from({ length: Math.min(limit, items.length) }, worker));
  if (failure) throw (failure as { error: unknown }).error;
  return out;
}

/**
 * Draws every planned placeholder and puts it through the upload pipeline's checks and
 * re-encoding (sharp works in its own threads, so this runs while the rows are inserted).
 */
export function renderDemoPhotos(plans: readonly DemoHistoryPlan[]): Promise<ProcessedPhoto[][]> {
  const limit = Math.max(2, os.availableParallelism());
  return Promise.all(
    plans.map((plan) =>
      mapLimit(plan.photos, limit, async (photo) =>
        processPhoto(await renderPlaceholderPhoto(photo, plan.def.key)),
      ),
    ),
  );
}

async function insertChunked<E extends ObjectLiteral>(
  manager: EntityManager,
  entity: EntityTarget<E>,
  rows: QueryDeepPartialEntity<E>[],
): Promise<void> {
  for (let i = 0; i < rows.length; i += CHUNK_ROWS) {
    await manager
      .createQueryBuilder()
      .insert()
      .into(entity)
      .values(rows.slice(i, i + CHUNK_ROWS))
      .updateEntity(false)
      .execute();
  }
}

const URGENT = new Set<Symptom>(URGENT_SYMPTOMS);

/** Inserts the check-in rows of every athlete (ids of the athletes by definition key). */
export async function writeDemoCheckIns(
  manager: EntityManager,
  plans: readonly DemoHistoryPlan[],
  athleteIds: ReadonlyMap<string, string>,
): Promise<void> {
  const weighIns: QueryDeepPartialEntity<WeighIn>[] = [];
  const fluids: QueryDeepPartialEntity<FluidEntry>[] = [];
  const meals: QueryDeepPartialEntity<MealEntry>[] = [];
  const supplements: QueryDeepPartialEntity<SupplementEntry>[] = [];
  const evenings: QueryDeepPartialEntity<EveningLog>[] = [];
  const symptoms: QueryDeepPartialEntity<SymptomReport>[] = [];
  const flags: QueryDeepPartialEntity<AthleteFlag>[] = [];

  for (const { def, history } of plans) {
    const athleteId = athleteIds.get(def.key);
    if (!athleteId) throw new Error(`no athlete row for demo athlete ${def.key}`);
    const tz = def.timeZone;
    for (const day of history.days) {
      if (day.missed) continue;
      const localDate = day.date;
      // Rows carry the time they were logged, so "updated" and "raised at" read as on the day.
      const timed = (time: string) => {
        const at = localInstant(localDate, time, tz);
        return { athleteId, localDate, localTime: time, loggedAt: at, createdAt: at, updatedAt: at };
      };
      if (day.weighIn) {
        const w = day.weighIn;
        weighIns.push({
          ...timed(w.time),
          weightKg: w.weightKg,
          enteredValue: w.entered.value,
          enteredUnit: w.entered.unit,
          protocolConfirmed: true,
          tags: w.tags,
          cyclePhase: w.cyclePhase,
        });
      }
      for (const f of day.fluids) {
        fluids.push({
          ...timed(f.time),
          clientId: f.clientId,
          volumeMl: f.volumeMl,
          enteredValue: f.entered.value,
          enteredUnit: f.entered.unit,
          kind: f.kind,
        });
      }
      for (const m of day.meals) {
        meals.push({
          ...timed(m.time),
          clientId: m.clientId,
          name: m.name,
          source: m.source,
          proteinG: m.proteinG,
          carbohydrateG: m.carbohydrateG,
          fatG: m.fatG,
          fibreG: m.fibreG,
          alcoholG: m.alcoholG,
          energyKcal: m.energyKcal,
          // Generated meals are typed macros without a label: sodium unknown.
          sodiumMg: null,
        });
      }
      for (const s of day.supplements) {
        supplements.push({
          ...timed(s.time),
          clientId: s.clientId,
          name: s.name,
          dose: s.dose,
          doseUnit: s.doseUnit,
          scheduleItemId: null,
        });
      }
      for (const s of day.symptoms) {
        const id = randomUUID();
        const row = timed(s.time);
        symptoms.push({
          ...row,
          id,
          clientId: s.clientId,
          symptoms: s.symptoms,
          note: s.note,
          urgent: s.urgent,
        });
        if (s.urgent) {
          // The same flag the symptoms route raises (services/day-entry-kinds.ts), so the coach sees it.
          const urgent = s.symptoms.filter((x) => URGENT.has(x));
          flags.push({
            athleteId,
            localDate,
            kind: 'symptom',
            message: `Urgent symptoms reported at ${s.time}: ${urgent.map((x) => SYMPTOM_LABELS[x]).join(', ')}`,
            detail: { symptoms: s.symptoms, time: s.time },
            symptomReportId: id,
            createdAt: row.loggedAt,
            updatedAt: row.loggedAt,
          });
        }
      }
      if (day.evening) {
        const e = day.evening;
        const at = localInstant(localDate, '21:30', tz);
        evenings.push({
          athleteId,
          localDate,
          steps: e.steps,
          sleepHours: e.sleepHours,
          cardioMinutes: e.cardioMinutes,
          trainingDone: e.trainingDone,
          trainingNote: e.trainingNote,
          ratings: e.ratings,
          note: e.note,
          createdAt: at,
          updatedAt: at,
        });
      }
    }
  }

  await insertChunked(manager, WeighIn, weighIns);
  await insertChunked(manager, FluidEntry, fluids);
  await insertChunked(manager, MealEntry, meals);
  await insertChunked(manager, SupplementEntry, supplements);
  await insertChunked(manager, EveningLog, evenings);
  await insertChunked(manager, SymptomReport, symptoms);
  await insertChunked(manager, AthleteFlag, flags);
}

/**
 * Stores the rendered photos (both sizes through the storage adapter), then inserts their rows.
 * Every key written is pushed to `written` first, so the caller can remove the files if the
 * transaction fails afterwards.
 */
export async function writeDemoPhotos(
  manager: EntityManager,
  plans: readonly DemoHistoryPlan[],
  rendered: readonly ProcessedPhoto[][],
  athleteIds: ReadonlyMap<string, string>,
  storage: StorageAdapter,
  written: string[],
): Promise<number> {
  const rows: QueryDeepPartialEntity<ConditionPhoto>[] = [];
  const puts: { key: string; data: Buffer; contentType: string }[] = [];
  plans.forEach((plan, p) => {
    const athleteId = athleteIds.get(plan.def.key);
    if (!athleteId) throw new Error(`no athlete row for demo athlete ${plan.def.key}`);
    plan.photos.forEach((photo, i) => {
      const processed = rendered[p]?.[i];
      if (!processed) throw new Error(`photo ${i} of ${plan.def.key} was not rendered`);
      const thumbKey = newStorageKey(athleteId, processed.thumb.contentType);
      const displayKey = newStorageKey(athleteId, processed.display.contentType);
      puts.push(
        { key: thumbKey, data: processed.thumb.data, contentType: processed.thumb.contentType },
        { key: displayKey, data: processed.display.data, contentType: processed.display.contentType },
      );
      // Taken in the morning after the weigh-in, front, side and back a minute apart.
      const at = localInstant(photo.date, `07:3${RELAXED_POSES.indexOf(photo.pose)}`, plan.def.timeZone);
      rows.push({
        athleteId,
        localDate: photo.date,
        pose: photo.pose,
        width: processed.display.width,
        height: processed.display.height,
        thumbKey,
        displayKey,
        contentType: processed.display.contentType,
        bytes: processed.thumb.data.length + processed.display.data.length,
        contentHash: processed.contentHash,
        createdAt: at,
        updatedAt: at,
      });
    });
  });
  await mapLimit(puts, 8, async ({ key, data, contentType }) => {
    written.push(key);
    await storage.put(key, data, contentType);
  });
  await insertChunked(manager, ConditionPhoto, rows);
  return rows.length;
}
