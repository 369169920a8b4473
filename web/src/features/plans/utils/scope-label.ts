import type { GuardrailWarning, PlanContent } from '@driftmark/shared';
import { formatDate } from '@/lib/format';

/** Where a warning applies, in words: "Whole plan", a day type's name, or "Sat 5 Dec 2026". */
export function scopeLabel(
  w: Pick<GuardrailWarning, 'scope'>,
  content: Pick<PlanContent, 'dayTypes'> | null,
): string {
  if (w.scope.kind === 'plan') return 'Whole plan';
  if (w.scope.kind === 'date') return formatDate(w.scope.date);
  const key = w.scope.key;
  const name = content?.dayTypes.find((t) => t.key === key)?.name;
  return name ?? key;
}
