/**
 * Plausibility and size limits shared by forms and routes. Values are in SI units.
 * Ranges are chosen to refuse nonsense, not to judge a plan (guardrails do that).
 */
export const LIMITS = {
  email: { max: 254 },
  name: { min: 1, max: 100 },
  password: { min: 10, max: 200 },
  teamName: { min: 2, max: 100 },
  /** Adult standing height, cm. */
  heightCm: { min: 120, max: 230 },
  /** Body weight, kg (also a weigh-in limit). */
  weightKg: { min: 25, max: 300 },
  /** Usual daily fluid intake, mL. */
  usualWaterMl: { min: 500, max: 12000 },
  /** Usual daily energy intake, kcal. */
  usualEnergyKcal: { min: 800, max: 10000 },
  division: { max: 100 },
  /** Age in whole years at intake. */
  ageYears: { min: 16, max: 100 },
  /** Invitation links stay valid this long. */
  invitationTtlDays: 7,
  /** Password-reset links stay valid this long. */
  resetTokenTtlMinutes: 60,
} as const;
