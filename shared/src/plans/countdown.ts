import type { CountdownPreviewDay, PlanBaseline, PlanContent, TemplateView } from '../schemas/plans.js';
import type { EVENT_TYPES } from '../schemas/athletes.js';

export interface AppliedCountdown {
  content: PlanContent;
  effectiveFrom: string;
  days: CountdownPreviewDay[];
}

/**
 * A template applied to an athlete: the base content (the version in force, or a starter) with its
 * earlier countdown days removed and one dated day per template day (eventDate + offset) carrying the
 * template's targets and `countdownOffset`; days before `today` are listed as past and not added.
 * effectiveFrom = max(first countdown date, today).
 */
export function applyTemplate(input: {
  base: PlanContent | null;
  template: Pick<TemplateView, 'id' | 'name' | 'days'>;
  eventDate: string;
  eventType: (typeof EVENT_TYPES)[number];
  today: string;
  baseline: PlanBaseline;
}): AppliedCountdown {
  void input;
  throw new Error('not implemented');
}

/** The same countdown moved to a new event date (each countdown day keeps its offset). */
export function moveCountdown(input: {
  content: PlanContent;
  eventDate: string;
  today: string;
  baseline: PlanBaseline;
}): AppliedCountdown {
  void input;
  throw new Error('not implemented');
}
