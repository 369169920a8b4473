/** Every route path in one place, so links and redirects cannot drift apart. */
export const paths = {
  home: '/',
  signIn: '/sign-in',
  forgotPassword: '/forgot-password',
  resetPassword: '/reset-password',
  invite: (token: string) => `/invite/${encodeURIComponent(token)}`,
  intake: '/intake',
  settings: '/settings',
  /** Settings opened at the E-mail card. */
  settingsEmail: '/settings#e-mail',
  /** The landing page of an e-mail's unsubscribe link (public). */
  unsubscribe: (token: string) => `/unsubscribe?token=${encodeURIComponent(token)}`,
  /** The landing page of the account deletion e-mail's link (public). */
  accountDelete: (token: string) => `/account/delete?token=${encodeURIComponent(token)}`,
  /** The printable weekly report: the 7 days before a check-in's due date. */
  reportWeek: (athleteId: string, dueDate: string) =>
    `/report/athletes/${encodeURIComponent(athleteId)}/weeks/${dueDate}`,
  athleteHome: '/athlete',
  /** The coach's default screen: the review queue. */
  coachHome: '/coach',
  coachRoster: '/coach/roster',
  coachInvitations: '/coach/invitations',
  /** The API reference for staff (read from GET /api/openapi.json). */
  coachApiReference: '/coach/api',
  athletePhotos: '/athlete/photos',
  /** The athlete adds a packaged food: barcode (camera, photo or typed) or nutrition label. */
  athleteFoodNew: '/athlete/foods/new',
  /** Staff add a team food from a nutrition label. */
  coachFoodNew: '/coach/foods/new',
  athleteBody: '/athlete/body',
  /** The athlete's own weight chart, rate, adherence and their coach's marks. */
  athleteTrends: '/athlete/trends',
  athleteHistory: '/athlete/history',
  /** The athlete's weekly check-in: the week's figures, the coach's questions, the reply. */
  athleteWeekly: '/athlete/weekly',
  /** One of the athlete's own days (YYYY-MM-DD), editable. */
  athleteDay: (date: string) => `/athlete/days/${encodeURIComponent(date)}`,
  /** A coach's page of one athlete; with a date it opens that day. */
  coachAthlete: (athleteId: string, date?: string) =>
    `/coach/athletes/${encodeURIComponent(athleteId)}${date ? `?date=${encodeURIComponent(date)}` : ''}`,
  coachAthletePhotos: (athleteId: string) => `/coach/athletes/${encodeURIComponent(athleteId)}/photos`,
  coachAthleteBody: (athleteId: string) => `/coach/athletes/${encodeURIComponent(athleteId)}/body`,
  /** An athlete's charts over a range (2 weeks, 6 weeks, season), with the day table and the marks. */
  coachAthleteTrends: (athleteId: string, range?: string) =>
    `/coach/athletes/${encodeURIComponent(athleteId)}/trends${range ? `?range=${encodeURIComponent(range)}` : ''}`,
  /** An athlete's weekly check-ins; with an id it opens that one. */
  coachAthleteWeekly: (athleteId: string, checkInId?: string) =>
    `/coach/athletes/${encodeURIComponent(athleteId)}/weekly${checkInId ? `/${encodeURIComponent(checkInId)}` : ''}`,
  /** An athlete's plan: week view and editor; the countdown flow; the version history and one version. */
  coachAthletePlan: (athleteId: string) => `/coach/athletes/${encodeURIComponent(athleteId)}/plan`,
  coachAthletePlanCountdown: (athleteId: string) =>
    `/coach/athletes/${encodeURIComponent(athleteId)}/plan/countdown`,
  coachAthletePlanHistory: (athleteId: string, versionId?: string) =>
    `/coach/athletes/${encodeURIComponent(athleteId)}/plan/history${versionId ? `/${encodeURIComponent(versionId)}` : ''}`,
  /** The team's countdown templates, a new one, and one template. */
  coachTemplates: '/coach/templates',
  coachTemplateNew: '/coach/templates/new',
  coachTemplate: (templateId: string) => `/coach/templates/${encodeURIComponent(templateId)}`,
  devInbox: '/dev/inbox',
} as const;

/** Sign-in, coming back to `next` afterwards; `reason` says why a session ended (lib/session-end.ts). */
export function signInWithNext(next: string, reason?: string | null): string {
  return `${paths.signIn}?next=${encodeURIComponent(next)}${reason ? `&reason=${encodeURIComponent(reason)}` : ''}`;
}
