import { unacknowledgedWarning, type UnacknowledgedWarning } from '@driftmark/shared';
import type { ApiError } from './api-client';

/**
 * A 409 `guardrails_unacknowledged`'s `warnings` that match the shared schema, as the server judged
 * them (severity, source, and for a cut's severe one the stop signs); any other item is left out.
 * It pulls zod in: import it only from lazily loaded chunks (the plan editors, the cut-plan builder),
 * never from the sign-in or Today routes.
 */
export function judgedWarnings(error: ApiError): UnacknowledgedWarning[] {
  return error.warnings.flatMap((item) => {
    const parsed = unacknowledgedWarning.safeParse(item);
    return parsed.success ? [parsed.data] : [];
  });
}
