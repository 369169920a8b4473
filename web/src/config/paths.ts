/** Every route path in one place, so links and redirects cannot drift apart. */
export const paths = {
  home: '/',
  signIn: '/sign-in',
  forgotPassword: '/forgot-password',
  resetPassword: '/reset-password',
  invite: (token: string) => `/invite/${encodeURIComponent(token)}`,
  intake: '/intake',
  settings: '/settings',
  athleteHome: '/athlete',
  coachHome: '/coach',
  coachInvitations: '/coach/invitations',
  devInbox: '/dev/inbox',
} as const;

export function signInWithNext(next: string): string {
  return `${paths.signIn}?next=${encodeURIComponent(next)}`;
}
