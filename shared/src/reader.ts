import { VOLUME_UNIT_LABELS, volumeFromMl, weightFromKg, type VolumeUnit, type WeightUnit } from './units.js';

/**
 * Who reads a server-made text (a flag, a queue reason, a caution, an e-mail): their units, and
 * whether they are the athlete the text is about or staff reading about that athlete.
 */
export interface Reader {
  units: { weight: WeightUnit; volume: VolumeUnit };
  /** Null when the athlete reads about themself; else the athlete's name, for staff wording. */
  aboutAthlete: string | null;
}

const number = (n: number, digits: number) =>
  new Intl.NumberFormat('en-US', { maximumFractionDigits: digits, minimumFractionDigits: digits }).format(n);

/** A mass in the reader's unit, one decimal ("80.2 kg", "176.8 lb"). */
export function massText(kg: number, unit: WeightUnit): string {
  return `${number(weightFromKg(kg, unit), 1)} ${unit}`;
}

/** A volume in the reader's unit: whole mL, or fl oz with one decimal ("250 mL", "8.5 fl oz"). */
export function volumeText(ml: number, unit: VolumeUnit): string {
  return `${number(volumeFromMl(ml, unit), unit === 'ml' ? 0 : 1)} ${VOLUME_UNIT_LABELS[unit]}`;
}

// A figure followed by " kg" or " mL" as the server writes them ("1,500 mL", "−1.6 kg", "80 kg").
const FIGURE = /(?<![\w.,])(\d{1,3}(?:,\d{3})+|\d+)(\.\d+)? (kg|mL)\b/g;

/**
 * A server-made text, written in kg and mL, in the reader's units: each "<figure> kg" and
 * "<figure> mL" is converted (NIST SP 811 factors, `units.ts`); other words stay as they are.
 * Texts stored before the reader was known (flags, acknowledged warnings) pass through here on
 * their way out, so every reader sees their own units.
 */
export function inReaderUnits(text: string, units: Reader['units']): string {
  if (units.weight === 'kg' && units.volume === 'ml') return text;
  return text.replace(FIGURE, (match, whole: string, fraction: string | undefined, unit: string) => {
    const value = Number(`${whole.replaceAll(',', '')}${fraction ?? ''}`);
    if (unit === 'kg') return units.weight === 'kg' ? match : massText(value, units.weight);
    return units.volume === 'ml' ? match : volumeText(value, units.volume);
  });
}

/** "your countdown" for the athlete, "Mateo's countdown" for staff. */
export function possessive(reader: Pick<Reader, 'aboutAthlete'>): string {
  if (reader.aboutAthlete === null) return 'your';
  const name = reader.aboutAthlete.trim().split(/\s+/)[0] ?? reader.aboutAthlete;
  return name.endsWith('s') ? `${name}'` : `${name}'s`;
}
