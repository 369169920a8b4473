import { z } from 'zod';
import { cutWarningView } from './cuts.js';
import { guardrailWarning } from './plans.js';

/**
 * One warning a 409 `guardrails_unacknowledged` names, as the server judged it: a plan or countdown
 * guardrail warning, or a cut-plan warning. Sent in the error body's `warnings` so the web renders
 * the server's severity and source instead of working them out again.
 */
export const unacknowledgedWarning = z.union([guardrailWarning, cutWarningView]);
export type UnacknowledgedWarning = z.infer<typeof unacknowledgedWarning>;
