/**
 * Value lists and their words that screens draw with, kept apart from the zod schemas (which
 * build their enums from them) so a screen can show a label without loading zod.
 */

export const EVENT_TYPES = ['show', 'shoot', 'weigh_in', 'none'] as const;
export const EVENT_TYPE_LABELS: Record<(typeof EVENT_TYPES)[number], string> = {
  show: 'Show',
  shoot: 'Photo shoot',
  weigh_in: 'Weigh-in',
  none: 'No event',
};

/**
 * A metric's verdict on a day (rules in shared/src/rules/day-verdicts.ts). `in_progress` is the
 * athlete's today until their local day ends: figures "so far", never judged, never counted.
 */
export const DRIFT_STATES = ['on_plan', 'drifting', 'off_plan', 'not_logged', 'in_progress'] as const;
export type DriftState = (typeof DRIFT_STATES)[number];
/** The states of a finished day with a logged value. */
export type JudgedState = Extract<DriftState, 'on_plan' | 'drifting' | 'off_plan'>;
export const DRIFT_STATE_LABELS: Record<DriftState, string> = {
  on_plan: 'On plan',
  drifting: 'Drifting',
  off_plan: 'Off plan',
  not_logged: 'Not logged',
  in_progress: 'So far',
};

/** A mark: a coach's note pinned to a chart's date or date range for one athlete. */
export const MARK_METRICS = ['weight', 'fluids', 'energy', 'macros', 'general'] as const;
export type MarkMetric = (typeof MARK_METRICS)[number];
export const MARK_METRIC_LABELS: Record<MarkMetric, string> = {
  weight: 'Weight',
  fluids: 'Fluids',
  energy: 'Energy',
  macros: 'Macros',
  general: 'General',
};
