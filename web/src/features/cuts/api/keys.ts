export const cutKeys = {
  all: ['cuts'] as const,
  detail: (athleteId: string) => [...cutKeys.all, athleteId] as const,
};
