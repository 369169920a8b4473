/**
 * Placeholder condition photos for the demo athletes: abstract compositions drawn with sharp from
 * SVG (coloured panels, discs and bands, with the pose and date written in), never a person or a
 * body outline. One band's length follows the athlete's modelled weight, so comparing two dates in
 * the gallery shows a change the way a real pair of photos would.
 *
 * planPhotos is pure and deterministic; renderPlaceholderPhoto draws one image.
 */
import { RELAXED_POSES } from '@driftmark/shared';
import sharp from 'sharp';
import type { DemoAthleteDefinition, DemoSituation } from './demo-team.js';
import type { AthleteHistory } from './history.js';

export type RelaxedPose = (typeof RELAXED_POSES)[number];

export interface PlannedPhoto {
  date: string;
  pose: RelaxedPose;
  /** Modelled body mass that day, kg (drives the band length). */
  modelKg: number;
  /** Body mass when the history starts, kg. */
  startKg: number;
}

/** Source size: small, so rendering and re-encoding stay quick. */
export const PLACEHOLDER_SIZE = { width: 600, height: 800 } as const;

/** Days between photo sessions: every two weeks, every three for the athlete who skips check-ins. */
const sessionEveryDays = (situation: DemoSituation) => (situation === 'skips_check_ins' ? 21 : 14);
/** A session falling on a missed day moves to the next logged day within this many days, or is skipped. */
const SESSION_SLACK_DAYS = 3;

/**
 * Photo days of an athlete with photo consent: front, side and back relaxed every two weeks from
 * the first day of the history (three for the skipper), on logged days only, plus a last session
 * the day before the seed for the athlete in the final week.
 */
export function planPhotos(def: DemoAthleteDefinition, history: AthleteHistory): PlannedPhoto[] {
  if (!def.intake.photoConsent) return [];
  const days = history.days;
  const startKg = days[0]?.modelKg ?? def.history.startWeightKg;
  const sessionDays = new Set<number>();
  for (let target = 0; target < days.length; target += sessionEveryDays(def.key)) {
    for (let i = target; i <= Math.min(target + SESSION_SLACK_DAYS, days.length - 1); i++) {
      if (!days[i]?.missed) {
        sessionDays.add(i);
        break;
      }
    }
  }
  if (def.key === 'final_week' && days.length > 0 && !days.at(-1)?.missed) sessionDays.add(days.length - 1);
  return [...sessionDays]
    .sort((a, b) => a - b)
    .flatMap((i) => {
      const day = days[i];
      if (!day) return [];
      return RELAXED_POSES.map((pose) => ({ date: day.date, pose, modelKg: day.modelKg, startKg }));
    });
}

/** One hue per athlete, so each gallery has its own colour. */
const HUES: Record<DemoSituation, number> = {
  final_week: 205,
  weigh_in: 350,
  photo_shoot: 280,
  long_diet: 160,
  regain: 30,
  skips_check_ins: 95,
};

function escapeXml(text: string): string {
  return text.replace(/[<>&'"]/g, (c) => `&#${c.charCodeAt(0)};`);
}

/** The SVG of one placeholder (exported for tests). */
export function placeholderSvg(photo: PlannedPhoto, situation: DemoSituation): string {
  const { width: w, height: h } = PLACEHOLDER_SIZE;
  const hue = HUES[situation];
  const poseIndex = RELAXED_POSES.indexOf(photo.pose);
  // A horizontal band whose length follows body mass against the dashed outline of the first
  // day: 10 % lighter reads as a clearly shorter band. Nothing here is shaped like a person.
  const full = 440;
  const band = Math.round(
    Math.max(60, Math.min(full + 40, full * (1 + (photo.modelKg / photo.startKg - 1) * 3))),
  );
  const bandX = (w - full) / 2;
  // Each pose places the discs differently (front: both top corners, side: one, back: a row).
  const discs: [number, number, number][] =
    poseIndex === 0
      ? [
          [110, 190, 50],
          [490, 190, 50],
        ]
      : poseIndex === 1
        ? [[470, 190, 60]]
        : [
            [180, 185, 34],
            [300, 185, 34],
            [420, 185, 34],
          ];
  const font = `'DejaVu Sans', 'Liberation Sans', Arial, sans-serif`;
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}" viewBox="0 0 ${w} ${h}">
  <defs>
    <linearGradient id="bg" x1="0" y1="0" x2="0" y2="1">
      <stop offset="0" stop-color="hsl(${hue}, 45%, 88%)"/>
      <stop offset="1" stop-color="hsl(${hue}, 35%, 70%)"/>
    </linearGradient>
  </defs>
  <rect width="${w}" height="${h}" fill="url(#bg)"/>
  <rect x="40" y="40" width="${w - 80}" height="${h - 80}" rx="24" fill="none" stroke="hsl(${hue}, 30%, 45%)" stroke-width="3" stroke-dasharray="12 10"/>
  <rect x="${bandX}" y="300" width="${full}" height="150" rx="20" fill="none" stroke="hsl(${hue}, 35%, 35%)" stroke-width="3" stroke-dasharray="8 8"/>
  <rect x="${bandX}" y="300" width="${band}" height="150" rx="20" fill="hsl(${hue}, 55%, 42%)" opacity="0.85"/>
  <rect x="${bandX}" y="470" width="${Math.round(full / 3)}" height="20" rx="10" fill="hsl(${(hue + 180) % 360}, 40%, 55%)" opacity="0.6"/>
  ${discs.map(([cx, cy, r]) => `<circle cx="${cx}" cy="${cy}" r="${r}" fill="hsl(${(hue + 40) % 360}, 60%, 60%)" opacity="0.8"/>`).join('\n  ')}
  <text x="${w / 2}" y="110" text-anchor="middle" font-family="${font}" font-size="40" font-weight="bold" fill="hsl(${hue}, 40%, 20%)">${escapeXml(photo.pose)}</text>
  <text x="${w / 2}" y="650" text-anchor="middle" font-family="${font}" font-size="34" fill="hsl(${hue}, 40%, 18%)">${escapeXml(photo.date)}</text>
  <text x="${w / 2}" y="735" text-anchor="middle" font-family="${font}" font-size="20" fill="hsl(${hue}, 30%, 25%)">Demo placeholder, not a real photo</text>
</svg>`;
}

/** A 600 × 800 JPEG of the placeholder. */
export async function renderPlaceholderPhoto(photo: PlannedPhoto, situation: DemoSituation): Promise<Buffer> {
  return sharp(Buffer.from(placeholderSvg(photo, situation)))
    .flatten({ background: '#ffffff' })
    .jpeg({ quality: 82 })
    .toBuffer();
}
