import {
  checkGuardrails,
  validatePlanContent,
  type GuardrailContext,
  type GuardrailWarning,
  type PlanBaseline,
  type PlanContent,
} from '@driftmark/shared';
import { useEffect, useState } from 'react';
import { useWatch, type Control } from 'react-hook-form';
import { toPlanContent, type PlanContentFormValues, type PlanFormValues } from './plan-form';

export interface PlanChecks {
  /** validatePlanContent: path (relative to the content) → message. */
  issues: Record<string, string>;
  warnings: GuardrailWarning[];
}

const EMPTY: PlanChecks = { issues: {}, warnings: [] };

/**
 * The same rules the server applies on save, run on the draft: refusals (shares not adding up…)
 * and guardrail warnings. A rule that throws on a half-typed draft is skipped; the server has the
 * last word.
 */
export function checkDraft(
  content: PlanContent,
  baseline: PlanBaseline,
  context: GuardrailContext,
): PlanChecks {
  let issues: Record<string, string>;
  let warnings: GuardrailWarning[];
  try {
    issues = validatePlanContent(content, baseline);
  } catch {
    issues = {};
  }
  try {
    warnings = checkGuardrails(content, context);
  } catch {
    warnings = [];
  }
  return { issues, warnings };
}

const DEBOUNCE_MS = 350;

/** The checks of the editor's draft, re-run a moment after typing stops. */
export function useLivePlanChecks(
  control: Control<PlanFormValues, unknown, unknown>,
  baseline: PlanBaseline,
  context: GuardrailContext,
): PlanChecks {
  const content = useWatch({ control, name: 'content' }) as PlanContentFormValues | undefined;
  const [checks, setChecks] = useState<PlanChecks>(EMPTY);
  // The watched object may be a new one on every render; its text changes only with the draft.
  const draft = content ? JSON.stringify(content) : '';
  useEffect(() => {
    if (!draft) return;
    const id = window.setTimeout(() => {
      const typed = JSON.parse(draft) as PlanContentFormValues;
      setChecks(checkDraft(toPlanContent(typed, true).content, baseline, context));
    }, DEBOUNCE_MS);
    return () => window.clearTimeout(id);
  }, [draft, baseline, context]);
  return checks;
}
