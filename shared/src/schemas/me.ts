import { z } from 'zod';
import { INVITABLE_ROLES, ROLES } from '../roles.js';
import { VOLUME_UNITS, WEIGHT_UNITS } from '../units.js';
import { personName, timeZone } from './common.js';

/** GET /api/me: the signed-in user. */
export const meResponse = z.object({
  /** User id. */
  id: z.uuid(),
  /** Sign-in e-mail. */
  email: z.string(),
  /** Display name. */
  name: z.string(),
  /** owner, coach, assistant or athlete. */
  role: z.enum(ROLES),
  /** The user's team. */
  team: z.object({ id: z.uuid(), name: z.string() }),
  /** For an athlete, the athlete id used in athlete routes; null for staff. */
  athleteId: z.uuid().nullable(),
  /** For an athlete: whether the intake form is done. Always true for staff. */
  intakeComplete: z.boolean(),
  /** The user's own time zone (IANA). */
  timeZone: z.string(),
  /** Units the user reads and types in. */
  units: z.object({ weight: z.enum(WEIGHT_UNITS), volume: z.enum(VOLUME_UNITS) }),
  /** What the server lets this user do on their team; the web shows controls from it. */
  abilities: z.object({
    /** Roles this user may invite (owner: all three; coach: athlete; others: none). */
    invite: z.array(z.enum(INVITABLE_ROLES)),
    /** Change team settings (owner only). */
    manageTeam: z.boolean(),
  }),
});
export type Me = z.infer<typeof meResponse>;

/** PATCH /api/me/settings: any subset. */
export const updateSettingsRequest = z
  .object({
    /** Display name. */
    name: personName,
    /** Own time zone (IANA). */
    timeZone,
    /** kg or lb. */
    weightUnit: z.enum(WEIGHT_UNITS, { error: 'Choose kg or lb' }),
    /** ml or floz (US fluid ounces). */
    volumeUnit: z.enum(VOLUME_UNITS, { error: 'Choose mL or fl oz' }),
  })
  .partial();
export type UpdateSettingsRequest = z.infer<typeof updateSettingsRequest>;
