import { RELAXED_POSES } from '@driftmark/shared';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { processPhoto } from '../adapters/images.js';
import { daysBetween } from './calendar.js';
import { DEMO_ATHLETES } from './demo-team.js';
import { generateHistory } from './history.js';
import { PLACEHOLDER_SIZE, placeholderSvg, planPhotos, renderPlaceholderPhoto } from './photos.js';

const seedDate = '2026-12-01';
const planned = DEMO_ATHLETES.map((def) => {
  const history = generateHistory(def, { seedDate });
  return { def, history, photos: planPhotos(def, history) };
});

describe('planPhotos', () => {
  it('plans front, side and back relaxed about every two weeks, on logged days only', () => {
    for (const { def, history, photos } of planned) {
      const dates = [...new Set(photos.map((p) => p.date))];
      expect(dates.length, def.key).toBeGreaterThanOrEqual(5);
      for (const date of dates) {
        expect(photos.filter((p) => p.date === date).map((p) => p.pose)).toEqual([...RELAXED_POSES]);
        const day = history.days.find((d) => d.date === date);
        expect(day?.missed, `${def.key} ${date}`).toBe(false);
      }
      dates.slice(1).forEach((date, i) => {
        const gap = daysBetween(dates[i]!, date);
        expect(gap, def.key).toBeGreaterThanOrEqual(def.key === 'final_week' ? 1 : 10);
        expect(gap, def.key).toBeLessThanOrEqual(24);
      });
      expect(dates.at(-1)! <= history.days.at(-1)!.date).toBe(true);
    }
  });

  it('plans none without photo consent', () => {
    const def = DEMO_ATHLETES[0]!;
    const noConsent = { ...def, intake: { ...def.intake, photoConsent: false } };
    expect(planPhotos(noConsent, generateHistory(noConsent, { seedDate }))).toEqual([]);
  });
});

describe('placeholder photos', () => {
  const { def, photos } = planned[0]!;
  const first = photos[0]!;
  const last = photos.at(-1)!;

  it('write the pose and date and nothing shaped like a person', () => {
    const svg = placeholderSvg(first, def.key);
    expect(svg).toContain(first.pose);
    expect(svg).toContain(first.date);
    expect(svg).toContain('Demo placeholder');
    expect(svg).not.toMatch(/<path|<image|href=/);
    expect(placeholderSvg({ ...first, pose: 'Front <b>&' as never }, def.key)).toContain(
      'Front &#60;b&#62;&#38;',
    );
  });

  it('draw a shorter band as the athlete gets lighter', () => {
    const band = (svg: string) =>
      Number(/<rect x="[\d.]+" y="300" width="(\d+)" height="150" rx="20" fill="hsl/.exec(svg)?.[1]);
    expect(band(placeholderSvg(last, def.key))).toBeLessThan(band(placeholderSvg(first, def.key)));
  });

  it('render as a small JPEG that the upload pipeline accepts', async () => {
    const jpeg = await renderPlaceholderPhoto(first, def.key);
    const meta = await sharp(jpeg).metadata();
    expect(meta).toMatchObject({ format: 'jpeg', ...PLACEHOLDER_SIZE });
    expect(meta.exif).toBeUndefined();
    const processed = await processPhoto(jpeg);
    expect(processed.format).toBe('jpeg');
    expect(processed.display).toMatchObject(PLACEHOLDER_SIZE);
    expect(Math.max(processed.thumb.width, processed.thumb.height)).toBeLessThanOrEqual(320);
  });
});
