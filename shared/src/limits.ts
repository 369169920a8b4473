/**
 * Plausibility and size limits shared by forms and routes. Values are in SI units.
 * Ranges are chosen to refuse nonsense, not to judge a plan (guardrails do that).
 */
export const LIMITS = {
  email: { max: 254 },
  name: { min: 1, max: 100 },
  /**
   * Characters for the form; `maxBytes` is the bcrypt input limit in UTF-8 bytes: "The maximum
   * input length is 72 bytes" (bcryptjs 3 README; bcrypt's key schedule, Provos & Mazières 1999).
   * bcrypt ignores the rest, so a longer password is refused rather than silently cut.
   */
  password: { min: 10, max: 200, maxBytes: 72 },
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
  eventName: { max: 100 },
  /** Age in whole years at intake. */
  ageYears: { min: 16, max: 100 },
  /** Invitation links stay valid this long. */
  invitationTtlDays: 7,
  /** Password-reset links stay valid this long. */
  resetTokenTtlMinutes: 60,

  // Daily check-in (SI units). Each refuses nonsense, not unusual days.
  /** One fluid entry, mL (30 L in one entry is refused). */
  fluidEntryMl: { min: 1, max: 5000 },
  /** Sodium in one drink, mg: a plausibility bound, as the meal's (common practice, no source). */
  fluidSodiumMg: { min: 0, max: 5000 },
  /** Grams per meal entry. */
  mealProteinG: { min: 0, max: 500 },
  mealCarbohydrateG: { min: 0, max: 1500 },
  mealFatG: { min: 0, max: 500 },
  mealFibreG: { min: 0, max: 200 },
  mealAlcoholG: { min: 0, max: 300 },
  /** Sodium in one meal entry, mg. */
  mealSodiumMg: { min: 0, max: 20000 },
  /** Quantity of a food from the food list, g. */
  foodQuantityG: { min: 1, max: 5000 },
  /** Foods in one meal. */
  mealItems: { min: 1, max: 20 },
  /** Portions of a food in one meal item ("2 slices", "1.5 scoops"). */
  portionCount: { min: 0.25, max: 50 },
  /** Nutrients per 100 g of a team food. */
  per100gMacroG: { min: 0, max: 100 },
  per100gSodiumMg: { min: 0, max: 40000 },
  /** A nutrition label's serving, g or mL. */
  labelServing: { min: 1, max: 2000 },
  /** Grams of one macro as printed on a label (per 100 g or per serving). */
  labelMacroG: { min: 0, max: 2000 },
  /** Sodium as printed, mg (per 100 g or per serving). */
  labelSodiumMg: { min: 0, max: 100000 },
  /** Energy as printed, kcal or kJ (per 100 g or per serving). */
  labelEnergy: { min: 0, max: 40000 },
  /** Density of a liquid served in mL, g/mL. */
  labelDensity: { min: 0.5, max: 2.5 },
  mealName: { min: 1, max: 120 },
  foodName: { min: 2, max: 120 },
  supplementName: { min: 1, max: 80 },
  supplementDose: { min: 0, max: 100000 },
  supplementUnit: { max: 16 },
  steps: { min: 0, max: 150000 },
  sleepHours: { min: 0, max: 24 },
  cardioMinutes: { min: 0, max: 720 },
  rating: { min: 1, max: 5 },
  note: { max: 2000 },
  trainingNote: { max: 120 },
  // Plans, countdown templates and weekly check-ins (free text).
  planItem: { min: 1, max: 80 },
  planUnit: { max: 16 },
  dayTypeName: { min: 1, max: 40 },
  dayLabel: { max: 60 },
  templateName: { min: 2, max: 80 },
  templateDescription: { max: 1000 },
  warningKey: { max: 120 },
  /** What the acute part of a cut consists of (free text). */
  cutNotes: { max: 2000 },
  /** What was done on one day of a practice cut (free text). */
  rehearsalNote: { max: 1000 },
  /** Days of acute loss before a weigh-in a cut plan may hold. */
  cutAcuteDays: { min: 0, max: 14 },
  /** The team's acute-share threshold, % of body mass. */
  acuteSharePct: { min: 1, max: 10 },
  question: { min: 3, max: 200 },
  answer: { max: 1000 },
  questionsForCoach: { max: 2000 },
  weeklyReply: { min: 1, max: 4000 },
  /** Dates a request may name, in whole years from the server's today (common practice, no source). */
  dateWindow: { historyYears: 5, aheadYears: 3 },
  /** A clock time this far past "now" still counts as now (phone clocks drift). */
  futureSlackMinutes: 5,
  /** Entries per kind per day. */
  entriesPerDay: 100,

  // Condition photos.
  photoMaxBytes: 15 * 1024 * 1024,
  photosPerUpload: 8,
  /** Decompression-bomb guard: width × height. */
  photoMaxPixels: 50_000_000,
  photoTypes: ['image/jpeg', 'image/png', 'image/webp', 'image/avif'],
  poseName: { min: 1, max: 60 },

  // Body composition (plausibility only, common practice, no source).
  /** One skinfold, mm (calipers read to about 60–80 mm). */
  skinfoldMm: { min: 1, max: 90 },
  /** Neck, waist and hip circumferences, cm. */
  neckCm: { min: 20, max: 70 },
  waistCm: { min: 40, max: 200 },
  hipCm: { min: 50, max: 200 },
  /** Who took the measurement ("Coach Sam", "self"). */
  measuredBy: { min: 1, max: 80 },
  posesPerTeam: 40,
} as const;
