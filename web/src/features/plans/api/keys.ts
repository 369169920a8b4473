export const planKeys = {
  all: ['plans'] as const,
  /** Everything plan-related of one athlete: what any plan write invalidates. */
  athlete: (athleteId: string) => [...planKeys.all, athleteId] as const,
  /** GET …/plan: the history, the current and latest versions, baseline and guardrail context. */
  plan: (athleteId: string) => [...planKeys.athlete(athleteId), 'plan'] as const,
  /** GET …/plan/versions/:versionId. */
  version: (athleteId: string, versionId: string) =>
    [...planKeys.athlete(athleteId), 'version', versionId] as const,
};

/** The team's countdown templates (GET /api/countdown-templates, …/:templateId). */
export const templateKeys = {
  all: ['countdown-templates'] as const,
  list: () => [...templateKeys.all, 'list'] as const,
  detail: (templateId: string) => [...templateKeys.all, 'detail', templateId] as const,
};
