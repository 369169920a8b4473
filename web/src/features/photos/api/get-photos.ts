import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { photoKeys, type PhotoFilter } from './keys';
import type { PhotoView } from './types';

export function photosPath(athleteId: string, filter: PhotoFilter = {}): string {
  const params = new URLSearchParams();
  if (filter.pose) params.set('pose', filter.pose);
  if (filter.from) params.set('from', filter.from);
  if (filter.to) params.set('to', filter.to);
  const query = params.toString();
  return `/api/athletes/${encodeURIComponent(athleteId)}/photos${query ? `?${query}` : ''}`;
}

/** GET /api/athletes/:athleteId/photos?pose&from&to: newest day first. */
export function getPhotos(
  athleteId: string,
  filter: PhotoFilter = {},
  signal?: AbortSignal,
): Promise<PhotoView[]> {
  return api.get<PhotoView[]>(photosPath(athleteId, filter), signal);
}

export function photosQueryOptions(athleteId: string, filter: PhotoFilter = {}) {
  return queryOptions({
    queryKey: photoKeys.list(athleteId, filter),
    queryFn: ({ signal }) => getPhotos(athleteId, filter, signal),
  });
}

export function usePhotos(athleteId: string, filter: PhotoFilter = {}) {
  return useQuery({ ...photosQueryOptions(athleteId, filter), enabled: athleteId !== '' });
}
