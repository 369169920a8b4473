import { LIMITS } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { checkChosenFiles, datesForPose, groupByDate, photoFor, posesWithPhotos } from './photo-sets';

const p = (id: string, date: string, pose: string, createdAt = `${date}T08:00:00Z`) => ({
  id,
  date,
  pose,
  createdAt,
});

const photos = [
  p('a', '2026-11-30', 'Front relaxed'),
  p('b', '2026-11-30', 'Back relaxed'),
  p('c', '2026-11-23', 'Front relaxed', '2026-11-23T07:00:00Z'),
  p('d', '2026-11-23', 'Front relaxed', '2026-11-23T09:30:00Z'),
  p('e', '2026-11-16', 'Side chest'),
  p('f', '2026-11-16', 'Old pose'),
];

describe('photo sets', () => {
  it('groups by day, newest first, keeping the order within a day', () => {
    const groups = groupByDate([photos[2]!, photos[0]!, photos[3]!, photos[1]!]);
    expect(groups.map((g) => [g.date, g.photos.map((x) => x.id)])).toEqual([
      ['2026-11-30', ['a', 'b']],
      ['2026-11-23', ['c', 'd']],
    ]);
  });

  it('lists poses with photos in the team order, then unknown ones alphabetically', () => {
    expect(posesWithPhotos(photos, ['Front relaxed', 'Side relaxed', 'Back relaxed', 'Side chest'])).toEqual([
      'Front relaxed',
      'Back relaxed',
      'Side chest',
      'Old pose',
    ]);
  });

  it('finds the dates of a pose and the last photo of a day', () => {
    expect(datesForPose(photos, 'Front relaxed')).toEqual(['2026-11-30', '2026-11-23']);
    expect(photoFor(photos, 'Front relaxed', '2026-11-23')?.id).toBe('d');
    expect(photoFor(photos, 'Front relaxed', '2026-01-01')).toBeNull();
  });

  it('checks chosen files before sending', () => {
    const ok = { name: 'a.jpg', size: 1000, type: 'image/jpeg' };
    expect(checkChosenFiles([ok])).toBeNull();
    expect(checkChosenFiles([{ ...ok, type: '' }])).toBeNull();
    expect(checkChosenFiles([])).toBe('Choose at least one photo.');
    expect(checkChosenFiles(Array.from({ length: LIMITS.photosPerUpload + 1 }, () => ok))).toMatch(
      /at most 8/,
    );
    expect(checkChosenFiles([{ ...ok, name: 'v.svg', type: 'image/svg+xml' }])).toBe(
      '"v.svg" is not a JPEG, PNG, WebP or AVIF image.',
    );
    expect(checkChosenFiles([{ ...ok, size: LIMITS.photoMaxBytes + 1 }])).toBe(
      '"a.jpg" is larger than 15 MB.',
    );
  });
});
