import type { DayView, VolumeUnit, WeightUnit } from '@driftmark/shared';

/** What every card of a day needs. */
export interface DayCardProps {
  athleteId: string;
  day: DayView;
  /** The reader's units: values are shown (and new ones typed) in these. */
  units: { weight: WeightUnit; volume: VolumeUnit };
  /** The athlete on their own day; staff read only. */
  canEdit: boolean;
  /** The clock now ("HH:MM") in the athlete's time zone: the default time of a new entry. */
  now: string;
}
