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

/** One signed-in device in GET /api/me/sessions (the user's own live sessions, most recently seen first). */
export const signedInDevice = z.object({
  /** The session id (DELETE /api/me/sessions/:id signs it out). */
  id: z.uuid(),
  /** A readable summary of the browser's user agent, e.g. "Safari on iPhone"; "Unknown device" when it sent none. */
  device: z.string(),
  /** When this device signed in (ISO 8601). */
  signedInAt: z.string(),
  /** When this device was last seen, to within the session refresh interval (ISO 8601). */
  lastSeenAt: z.string(),
  /** When the session ends if the device is not used again (idle end, never past the absolute end; ISO 8601). */
  endsAt: z.string(),
  /** True for the device making this request. */
  current: z.boolean(),
});
export type SignedInDevice = z.infer<typeof signedInDevice>;

/** POST /api/me/sessions/sign-out-others: how many other devices were signed out. */
export const signOutOthersResponse = z.object({ signedOut: z.number().int().min(0) });
export type SignOutOthersResponse = z.infer<typeof signOutOthersResponse>;
