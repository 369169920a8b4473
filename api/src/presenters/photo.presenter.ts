import type { photoView } from '@driftmark/shared';
import type { z } from 'zod';
import type { ConditionPhoto } from '../entities/condition-photo.entity.js';

export type PhotoView = z.infer<typeof photoView>;

/** The authorized URL of one stored size (the route checks the athlete policy on every request). */
export function photoUrl(photoId: string, size: 'thumb' | 'display'): string {
  return `/api/photos/${photoId}/${size}`;
}

export function presentPhoto(photo: ConditionPhoto): PhotoView {
  return {
    id: photo.id,
    date: photo.localDate,
    pose: photo.pose,
    width: photo.width,
    height: photo.height,
    urls: { thumb: photoUrl(photo.id, 'thumb'), display: photoUrl(photo.id, 'display') },
    createdAt: photo.createdAt.toISOString(),
  };
}
