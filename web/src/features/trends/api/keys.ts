export const trendKeys = {
  all: ['trends'] as const,
  /** Every trend range of one athlete: what a change to any of their days invalidates. */
  athlete: (athleteId: string) => [...trendKeys.all, athleteId] as const,
  /** GET …/trend?from&to. */
  detail: (athleteId: string, from: string, to: string) =>
    [...trendKeys.athlete(athleteId), 'range', from, to] as const,
};
