import { DRIFT_STATE_LABELS, type DriftState } from '@driftmark/shared';
import type { BadgeTone } from '@/components/ui/badge';

/**
 * The drift states' visual language, defined once: a colour token and a shape each, so a state never
 * rests on colour alone (charts, tables and badges all read from here). Shapes match the Badge glyphs.
 * The day in progress ("so far") is drawn open: a hollow dashed bar and a clock glyph, never a verdict.
 */
export const DRIFT_STATE_STYLE: Record<
  DriftState,
  {
    label: string;
    tone: BadgeTone;
    color: string;
    soft: string;
    shape: 'dot' | 'half' | 'square' | 'ring' | 'clock';
  }
> = {
  on_plan: {
    label: DRIFT_STATE_LABELS.on_plan,
    tone: 'on-plan',
    color: 'var(--color-on-plan)',
    soft: 'var(--color-on-plan-soft)',
    shape: 'dot',
  },
  drifting: {
    label: DRIFT_STATE_LABELS.drifting,
    tone: 'drifting',
    color: 'var(--color-drifting)',
    soft: 'var(--color-drifting-soft)',
    shape: 'half',
  },
  off_plan: {
    label: DRIFT_STATE_LABELS.off_plan,
    tone: 'off-plan',
    color: 'var(--color-off-plan)',
    soft: 'var(--color-off-plan-soft)',
    shape: 'square',
  },
  not_logged: {
    label: DRIFT_STATE_LABELS.not_logged,
    tone: 'not-logged',
    color: 'var(--color-not-logged)',
    soft: 'var(--color-not-logged-soft)',
    shape: 'ring',
  },
  in_progress: {
    label: DRIFT_STATE_LABELS.in_progress,
    tone: 'in-progress',
    color: 'var(--color-accent)',
    soft: 'var(--color-accent-soft)',
    shape: 'clock',
  },
};
