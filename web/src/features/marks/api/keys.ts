/** Which marks a list asks for: both ends optional (GET …/marks?from&to), every mark when empty. */
export interface MarkRange {
  from?: string;
  to?: string;
}

export const markKeys = {
  all: ['marks'] as const,
  /** Every mark list of one athlete, whatever its range: what any mark write invalidates. */
  athlete: (athleteId: string) => [...markKeys.all, athleteId] as const,
  list: (athleteId: string, range: MarkRange = {}) =>
    [...markKeys.athlete(athleteId), 'list', range.from ?? '', range.to ?? ''] as const,
};
