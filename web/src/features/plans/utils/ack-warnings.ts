import type { GuardrailWarning } from '@driftmark/shared';
import { isApiError } from '../../../lib/api-client';
import { judgedWarnings } from '../../../lib/judged-warnings';

/** A warning as the acknowledgement step lists it. */
export interface AckWarning {
  key: string;
  message: string;
  /** Empty when only the server's key and message are known (a 409 from a server without `warnings`). */
  source: string;
  severity: GuardrailWarning['severity'];
  /** Where it applies ("Rest day", "Sat 5 Dec 2026", "Whole plan"). */
  where: string | null;
}

export function toAckWarnings(
  warnings: readonly GuardrailWarning[],
  where: (w: GuardrailWarning) => string | null,
): AckWarning[] {
  return warnings.map((w) => ({
    key: w.key,
    message: w.message,
    source: w.source,
    severity: w.severity,
    // A day's or day type's message already opens with its name; only plan-wide ones need a label.
    where: w.scope.kind === 'plan' ? where(w) : null,
  }));
}

/**
 * After a 409 guardrails_unacknowledged: the server's list, each warning as the server judged it
 * (`warnings`: severity, source, scope), keeping what is already known of each. A body from an older
 * server carries only `fields` (key → message): those show without a source, at the higher severity
 * rather than a guessed one. Null for any other error.
 */
export function unacknowledgedFromError(
  error: unknown,
  known: readonly AckWarning[],
  where: (w: GuardrailWarning) => string | null = () => null,
): AckWarning[] | null {
  if (!isApiError(error) || error.code !== 'guardrails_unacknowledged') return null;
  const byKey = new Map(known.map((w) => [w.key, w]));
  const judged = new Map(judgedWarnings(error).map((w) => [w.key, w]));
  const fromServer = Object.entries(error.fields).map(([key, message]): AckWarning => {
    const w = judged.get(key);
    if (w) {
      const scoped = 'scope' in w ? toAckWarnings([w], where)[0] : undefined;
      // A plan's list has two levels; a cut's severe warning (never sent to a plan editor) reads as strong.
      const severity = w.severity === 'severe' ? 'strong' : w.severity;
      return scoped ?? { key, message: w.message, source: w.source, severity, where: null };
    }
    return byKey.get(key) ?? { key, message, source: '', severity: 'strong', where: null };
  });
  // Keep the ones already ticked in the list too: the save sends every current key.
  const serverKeys = new Set(fromServer.map((w) => w.key));
  return [...known.filter((w) => !serverKeys.has(w.key)), ...fromServer];
}
