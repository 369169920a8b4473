/** Which photos a gallery list asks for (all optional: every photo of the athlete). */
export interface PhotoFilter {
  pose?: string;
  from?: string;
  to?: string;
}

export const photoKeys = {
  all: ['photos'] as const,
  /** Every list of one athlete, whatever its filter: what an upload or a delete invalidates. */
  athlete: (athleteId: string) => [...photoKeys.all, athleteId] as const,
  list: (athleteId: string, filter: PhotoFilter = {}) =>
    [...photoKeys.athlete(athleteId), 'list', filter.pose ?? '', filter.from ?? '', filter.to ?? ''] as const,
};

export const poseKeys = {
  all: ['team-poses'] as const,
};
