import type { DayView } from '@driftmark/shared';
import type { EntityManager } from 'typeorm';
import { countPhotosByDay, listDayPhotos } from './photo.service.js';

/**
 * Where the day view and the history list get their photos: the photos feature's repository,
 * read with the caller's manager.
 */
export interface DayPhotoSource {
  forDay(athleteId: string, date: string): Promise<DayView['photos']>;
  /** Photo count per local date (YYYY-MM-DD) between two dates, inclusive. */
  countsByDay(athleteId: string, from: string, to: string): Promise<Map<string, number>>;
}

export function dayPhotoSource(manager: EntityManager): DayPhotoSource {
  return {
    forDay: (athleteId, date) => listDayPhotos(manager, athleteId, date),
    countsByDay: (athleteId, from, to) => countPhotosByDay(manager, athleteId, from, to),
  };
}
