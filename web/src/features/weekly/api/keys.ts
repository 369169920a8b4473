export const weeklyKeys = {
  all: ['weekly-check-ins'] as const,
  /** Everything weekly of one athlete: what any check-in write invalidates. */
  athlete: (athleteId: string) => [...weeklyKeys.all, 'athlete', athleteId] as const,
  /** GET /api/athletes/:athleteId/weekly-check-ins (newest first). */
  list: (athleteId: string) => [...weeklyKeys.athlete(athleteId), 'list'] as const,
  /** GET /api/athletes/:athleteId/weekly-check-ins/current (the one due now). */
  current: (athleteId: string) => [...weeklyKeys.athlete(athleteId), 'current'] as const,
  /** GET /api/athletes/:athleteId/weekly-check-ins/week/:dueDate (any week due so far). */
  week: (athleteId: string, dueDate: string) => [...weeklyKeys.athlete(athleteId), 'week', dueDate] as const,
  /** GET /api/weekly-check-ins/:checkInId. */
  detail: (checkInId: string) => [...weeklyKeys.all, 'detail', checkInId] as const,
};

/** The team's question list (GET/PUT /api/team/check-in-questions). */
export const checkInQuestionKeys = {
  all: ['check-in-questions'] as const,
};

export function athleteWeeklyPath(athleteId: string): string {
  return `/api/athletes/${encodeURIComponent(athleteId)}/weekly-check-ins`;
}
