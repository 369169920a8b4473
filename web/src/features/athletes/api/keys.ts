export const rosterKeys = {
  all: ['roster'] as const,
};

export const athleteKeys = {
  all: ['athletes'] as const,
  detail: (athleteId: string) => [...athleteKeys.all, athleteId] as const,
};
