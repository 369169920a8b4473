import {
  DRIFT_METRIC_LABELS,
  DRIFT_METRICS,
  DRIFT_STATE_LABELS,
  VOLUME_UNIT_LABELS,
  WEIGHT_UNIT_LABELS,
  volumeFromMl,
  weightFromKg,
  type TrendDay,
  type VolumeUnit,
  type WeightUnit,
} from '@driftmark/shared';
import type { DataSource } from 'typeorm';
import { toCsv } from '../lib/csv.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import { TrendService } from './trend.service.js';

/** The units the viewer reads in (their own settings, not the athlete's). */
export type ViewerUnits = { weightUnit: WeightUnit; volumeUnit: VolumeUnit };

const round = (value: number | null | undefined, digits: number): number | null =>
  value === null || value === undefined ? null : Number(value.toFixed(digits));

/**
 * The days from..to as CSV (RFC 4180, CRLF, header row): date, weight, trend, 7-day mean, every
 * logged total, every target in force, each metric's drift state, the cut-off breach and countdown
 * label. Weights and fluids in the viewer's units; the rest in kcal, g, mg, steps and minutes.
 */
export function daysCsv(days: readonly TrendDay[], units: ViewerUnits): string {
  const w = WEIGHT_UNIT_LABELS[units.weightUnit];
  const v = VOLUME_UNIT_LABELS[units.volumeUnit];
  const wDigits = 2;
  const vDigits = units.volumeUnit === 'ml' ? 0 : 1;
  const weight = (kg: number | null) =>
    kg === null ? null : round(weightFromKg(kg, units.weightUnit), wDigits);
  const volume = (ml: number | null) =>
    ml === null ? null : round(volumeFromMl(ml, units.volumeUnit), vDigits);

  const header = [
    'Date',
    `Weight (${w})`,
    `Trend (${w})`,
    `7-day mean (${w})`,
    'Energy (kcal)',
    'Protein (g)',
    'Carbohydrate (g)',
    'Fat (g)',
    `Fluids (${v})`,
    'Sodium (mg)',
    'Steps',
    'Cardio (min)',
    'Target energy (kcal)',
    'Target protein (g)',
    'Target carbohydrate (g)',
    'Target fat (g)',
    `Target water (${v})`,
    'Target sodium (mg)',
    'Target steps',
    'Target cardio (min)',
    'Fluid cut-off',
    `Cut-off allowance (${v})`,
    'Plan version',
    ...DRIFT_METRICS.map((m) => `Drift: ${DRIFT_METRIC_LABELS[m]}`),
    `After cut-off beyond allowance (${v})`,
    'Countdown',
  ];
  const rows = days.map((d) => {
    const a = d.actuals;
    const t = d.targets;
    const drift = new Map(d.drift.map((e) => [e.metric, DRIFT_STATE_LABELS[e.state]]));
    return [
      d.date,
      weight(d.weightKg),
      weight(round(d.trendKg, 4)),
      weight(round(d.mean7Kg, 4)),
      round(a.energyKcal, 0),
      round(a.proteinG, 1),
      round(a.carbohydrateG, 1),
      round(a.fatG, 1),
      volume(a.fluidMl),
      round(a.sodiumMg, 0),
      a.steps,
      a.cardioMinutes,
      round(t?.energyKcal, 0),
      round(t?.proteinG, 1),
      round(t?.carbohydrateG, 1),
      round(t?.fatG, 1),
      t?.waterMl == null ? null : volume(t.waterMl),
      round(t?.sodiumMg, 0),
      t?.steps ?? null,
      t?.cardioMinutes ?? null,
      t?.fluidCutoff?.time ?? null,
      t?.fluidCutoff ? volume(t.fluidCutoff.allowanceMl) : null,
      t?.versionNumber ?? null,
      ...DRIFT_METRICS.map((m) => drift.get(m) ?? null),
      d.breach && d.breach.excessMl > 0 ? volume(d.breach.excessMl) : null,
      d.countdown?.dayLabel ?? null,
    ];
  });
  return toCsv([header, ...rows]);
}

/** A file name safe in a Content-Disposition header (ASCII letters, digits and dashes). */
export function daysCsvFileName(athleteName: string, from: string, to: string): string {
  const slug = athleteName
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .toLowerCase();
  return `driftmark-${slug || 'athlete'}-${from}-to-${to}.csv`;
}

type ExportDeps = { dataSource: DataSource; clock: () => Date };

export class DaysExportService {
  constructor(private readonly deps: ExportDeps) {}

  /** The CSV of from..to (the trend's range limit applies). */
  async daysCsv(athlete: AthleteWithPeople, from: string, to: string, units: ViewerUnits): Promise<string> {
    const view = await new TrendService(this.deps).getTrend(athlete, from, to);
    return daysCsv(view.days, units);
  }
}
