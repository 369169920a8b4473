export const bodyCompositionKeys = {
  all: ['body-composition'] as const,
  /** GET …/body-composition: every measurement of one athlete with its estimate. */
  athlete: (athleteId: string) => [...bodyCompositionKeys.all, athleteId] as const,
};
