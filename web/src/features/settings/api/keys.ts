export const guardrailKeys = {
  /** The team's guardrail floors (GET /api/team/guardrails). */
  floors: ['team-guardrails'] as const,
};
