import {
  describeChanges,
  type AcknowledgementView,
  type PlanVersionSummary,
  type PlanVersionView,
  type TemplateView,
} from '@driftmark/shared';
import type { PlanVersion } from '../entities/plan-version.entity.js';
import type { TemplateWithAuthor } from '../repositories/countdown-template.repository.js';
import type { AcknowledgementWithAuthor, PlanVersionWithAuthor } from '../repositories/plan.repository.js';

export function presentAcknowledgement(a: AcknowledgementWithAuthor): AcknowledgementView {
  return {
    key: a.key,
    code: a.code,
    severity: a.severity,
    scope: a.scope,
    message: a.message,
    source: a.source,
    by: { id: a.acknowledgedBy.id, name: a.acknowledgedBy.name },
    at: a.acknowledgedAt.toISOString(),
  };
}

/** A version as the history lists it; `previous` is the version saved just before it (number − 1). */
export function presentVersionSummary(
  v: PlanVersionWithAuthor,
  previous: PlanVersion | null,
  acknowledgementCount: number,
): PlanVersionSummary {
  return {
    id: v.id,
    number: v.number,
    effectiveFrom: v.effectiveFrom,
    reason: v.reason,
    createdBy: { id: v.createdBy.id, name: v.createdBy.name },
    createdAt: v.createdAt.toISOString(),
    changes: describeChanges(previous?.content ?? null, v.content, { effectiveFrom: v.effectiveFrom }),
    countdown: v.content.countdown,
    acknowledgementCount,
  };
}

export function presentVersion(
  v: PlanVersionWithAuthor,
  previous: PlanVersion | null,
  acknowledgements: readonly AcknowledgementWithAuthor[],
): PlanVersionView {
  return {
    ...presentVersionSummary(v, previous, acknowledgements.length),
    content: v.content,
    baseline: v.baseline,
    acknowledgements: acknowledgements.map(presentAcknowledgement),
  };
}

export function presentTemplate(t: TemplateWithAuthor): TemplateView {
  return {
    id: t.id,
    name: t.name,
    eventType: t.eventType,
    description: t.description,
    days: t.days,
    createdBy: { id: t.createdBy.id, name: t.createdBy.name },
    updatedAt: t.updatedAt.toISOString(),
  };
}
