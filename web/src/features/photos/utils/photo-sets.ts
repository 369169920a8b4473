import { LIMITS } from '@driftmark/shared';

/** What the gallery and compare views need of a photo. */
export interface PhotoLike {
  id: string;
  date: string;
  pose: string;
  createdAt: string;
}

export interface DayGroup<P extends PhotoLike> {
  date: string;
  photos: P[];
}

/** Photos by day, newest day first; within a day in the given order (the API's upload order). */
export function groupByDate<P extends PhotoLike>(photos: readonly P[]): DayGroup<P>[] {
  const groups = new Map<string, P[]>();
  for (const photo of photos) {
    const list = groups.get(photo.date) ?? [];
    list.push(photo);
    groups.set(photo.date, list);
  }
  return [...groups.entries()]
    .sort(([a], [b]) => (a < b ? 1 : a > b ? -1 : 0))
    .map(([date, list]) => ({ date, photos: list }));
}

/**
 * The poses that have photos, in the team's order first (`known`), then any others (a pose the
 * team has since removed from its list) alphabetically.
 */
export function posesWithPhotos(photos: readonly PhotoLike[], known: readonly string[]): string[] {
  const present = new Set(photos.map((p) => p.pose));
  const ordered = known.filter((pose) => present.has(pose));
  const rest = [...present].filter((pose) => !known.includes(pose)).sort((a, b) => a.localeCompare(b, 'en'));
  return [...ordered, ...rest];
}

/** Dates with a photo of `pose`, newest first. */
export function datesForPose(photos: readonly PhotoLike[], pose: string): string[] {
  return [...new Set(photos.filter((p) => p.pose === pose).map((p) => p.date))].sort((a, b) =>
    a < b ? 1 : a > b ? -1 : 0,
  );
}

/** The photo of `pose` on `date` to compare: the last one uploaded that day. */
export function photoFor<P extends PhotoLike>(photos: readonly P[], pose: string, date: string): P | null {
  let best: P | null = null;
  for (const p of photos) {
    if (p.pose !== pose || p.date !== date) continue;
    if (!best || p.createdAt >= best.createdAt) best = p;
  }
  return best;
}

const MB = 1024 * 1024;
const ACCEPTED: readonly string[] = LIMITS.photoTypes;

/** The file types a picker offers (`accept`), from the shared limits. */
export const PHOTO_ACCEPT = LIMITS.photoTypes.join(',');

/**
 * A first, friendly check before sending (the server checks the bytes again): at most
 * LIMITS.photosPerUpload files, each at most LIMITS.photoMaxBytes, of an accepted type. Returns the
 * message to show beside the field, or null.
 */
export function checkChosenFiles(
  files: readonly { name: string; size: number; type: string }[],
): string | null {
  if (files.length === 0) return 'Choose at least one photo.';
  if (files.length > LIMITS.photosPerUpload) return `Choose at most ${LIMITS.photosPerUpload} photos.`;
  for (const file of files) {
    // Some browsers leave the type empty; the server then decides from the bytes.
    if (file.type !== '' && !ACCEPTED.includes(file.type)) {
      return `"${file.name}" is not a JPEG, PNG, WebP or AVIF image.`;
    }
    if (file.size > LIMITS.photoMaxBytes) {
      return `"${file.name}" is larger than ${Math.round(LIMITS.photoMaxBytes / MB)} MB.`;
    }
  }
  return null;
}
