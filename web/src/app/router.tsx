import { isStaffRole, type Me } from '@driftmark/shared';
import type { ComponentType } from 'react';
import { createBrowserRouter, Outlet, ScrollRestoration } from 'react-router';
import { athleteQueryOptions } from '@/features/athletes/api/get-athlete';
import { rosterQueryOptions } from '@/features/athletes/api/get-roster';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { bodyCompositionQueryOptions } from '@/features/body-composition/api/get-body-composition';
import { dayQueryOptions } from '@/features/check-ins/api/get-day';
import { mailListQueryOptions } from '@/features/dev-inbox/api/get-mail-list';
import { invitationsQueryOptions } from '@/features/invitations/api/get-invitations';
import { marksQueryOptions } from '@/features/marks/api/list-marks';
import { planQueryOptions } from '@/features/plans/api/get-plan';
import { templateQueryOptions } from '@/features/plans/api/get-template';
import { templatesQueryOptions } from '@/features/plans/api/get-templates';
import { reviewQueueQueryOptions } from '@/features/review/api/get-review-queue';
import { currentWeeklyCheckInQueryOptions } from '@/features/weekly/api/get-current-weekly-check-in';
import { todayIn } from '@/lib/format';
import { queryClient } from '@/lib/query-client';
import { devInboxLoader } from './dev-inbox-gate';
import { RequireAthlete, RequireSignedIn, RequireStaff } from './guards';
import { AthleteShell } from './layouts/athlete-shell';
import { ShellForRole } from './layouts/shell-for-role';
import { NotFoundRoute } from './routes/not-found';
import { RootRedirect } from './routes/root-redirect';
import { RouteError } from './routes/route-error';

/**
 * A route's screen as its own chunk, loaded when the route is first visited: the sign-in page
 * never loads the charts, the tables or the plan editor. Loaders stay static, so data starts
 * loading together with the code.
 */
function page<K extends string>(load: () => Promise<Record<K, ComponentType>>, name: K) {
  return async () => ({ Component: (await load())[name] });
}

/**
 * Loaders only start fetches (the same query options the screens use) so data and the session
 * arrive together; they never block navigation, and screens keep their own loading states.
 */
function prefetchWhen(check: (me: Me) => boolean, prefetch: (me: Me) => void) {
  return () => {
    void queryClient
      .fetchQuery(meQueryOptions())
      .then((me) => {
        if (me && check(me)) prefetch(me);
      })
      .catch(() => undefined);
    return null;
  };
}

const prefetchOwnProfile = prefetchWhen(
  (me) => me.role === 'athlete' && me.athleteId !== null,
  (me) => void queryClient.prefetchQuery(athleteQueryOptions(me.athleteId!)),
);

/**
 * Today's screen: the profile, today's day (the athlete's own date), the weekly check-in banner and
 * the shell's unread marks start loading together, as soon as the session is known.
 */
const prefetchToday = prefetchWhen(
  (me) => me.role === 'athlete' && me.athleteId !== null,
  (me) => {
    void queryClient.prefetchQuery(athleteQueryOptions(me.athleteId!));
    void queryClient.prefetchQuery(dayQueryOptions(me.athleteId!, todayIn(me.timeZone)));
    void queryClient.prefetchQuery(currentWeeklyCheckInQueryOptions(me.athleteId!));
    void queryClient.prefetchQuery(marksQueryOptions(me.athleteId!));
  },
);

/** Trends: the profile (for the athlete's today) and the coach's marks start loading together. */
const prefetchOwnTrends = prefetchWhen(
  (me) => me.role === 'athlete' && me.athleteId !== null,
  (me) => {
    void queryClient.prefetchQuery(athleteQueryOptions(me.athleteId!));
    void queryClient.prefetchQuery(marksQueryOptions(me.athleteId!));
  },
);

function RootLayout() {
  return (
    <>
      <ScrollRestoration />
      <Outlet />
    </>
  );
}

export const router = createBrowserRouter([
  {
    element: <RootLayout />,
    errorElement: <RouteError />,
    children: [
      { index: true, element: <RootRedirect /> },
      { path: 'sign-in', lazy: page(() => import('./routes/sign-in'), 'SignInRoute') },
      {
        path: 'forgot-password',
        lazy: page(() => import('./routes/forgot-password'), 'ForgotPasswordRoute'),
      },
      { path: 'reset-password', lazy: page(() => import('./routes/reset-password'), 'ResetPasswordRoute') },
      {
        path: 'invite/:token',
        lazy: page(() => import('./routes/accept-invitation'), 'AcceptInvitationRoute'),
      },
      // Only where the demo inbox exists (demo mode, this machine); a 404 page anywhere else.
      {
        path: 'dev/inbox',
        loader: devInboxLoader(() => queryClient.fetchQuery(mailListQueryOptions())),
        lazy: page(() => import('./routes/dev-inbox'), 'DevInboxRoute'),
      },
      { path: 'unsubscribe', lazy: page(() => import('./routes/unsubscribe'), 'UnsubscribeRoute') },
      { path: 'account/delete', lazy: page(() => import('./routes/account-delete'), 'AccountDeleteRoute') },
      {
        element: <RequireSignedIn />,
        children: [
          // Printable, outside the shells: the week before a check-in's due date.
          {
            path: 'report/athletes/:athleteId/weeks/:dueDate',
            lazy: page(() => import('./routes/report-week'), 'ReportWeekRoute'),
          },
          {
            element: <RequireAthlete />,
            children: [
              {
                element: <AthleteShell />,
                children: [
                  {
                    path: 'athlete',
                    lazy: page(() => import('./routes/athlete-home'), 'AthleteHomeRoute'),
                    loader: prefetchToday,
                  },
                  {
                    path: 'athlete/history',
                    lazy: page(() => import('./routes/athlete-history'), 'AthleteHistoryRoute'),
                  },
                  {
                    path: 'athlete/days/:date',
                    lazy: page(() => import('./routes/athlete-day'), 'AthleteDayRoute'),
                    loader: prefetchOwnProfile,
                  },
                  {
                    path: 'athlete/photos',
                    lazy: page(() => import('./routes/athlete-photos'), 'AthletePhotosRoute'),
                    loader: prefetchOwnProfile,
                  },
                  {
                    path: 'athlete/body',
                    lazy: page(() => import('./routes/athlete-body'), 'AthleteBodyRoute'),
                    loader: prefetchOwnProfile,
                  },
                  {
                    path: 'athlete/foods/new',
                    lazy: page(() => import('./routes/athlete-foods'), 'AthleteFoodsRoute'),
                  },
                  {
                    path: 'athlete/trends',
                    lazy: page(() => import('./routes/athlete-trends'), 'AthleteTrendsRoute'),
                    loader: prefetchOwnTrends,
                  },
                  {
                    path: 'athlete/weekly',
                    lazy: page(() => import('./routes/athlete-weekly'), 'AthleteWeeklyRoute'),
                  },
                  {
                    path: 'intake',
                    lazy: page(() => import('./routes/intake'), 'IntakeRoute'),
                    loader: prefetchOwnProfile,
                  },
                ],
              },
            ],
          },
          {
            path: 'coach',
            element: <RequireStaff />,
            children: [
              {
                // Staff screens' shell is its own chunk: sign-in and the athlete's Today never load it.
                lazy: page(() => import('./layouts/staff-shell'), 'StaffShell'),
                children: [
                  {
                    index: true,
                    lazy: page(() => import('./routes/coach-review-queue'), 'CoachReviewQueueRoute'),
                    loader: prefetchWhen(
                      (me) => isStaffRole(me.role),
                      () => void queryClient.prefetchQuery(reviewQueueQueryOptions()),
                    ),
                  },
                  {
                    path: 'roster',
                    lazy: page(() => import('./routes/coach-roster'), 'CoachRosterRoute'),
                    loader: prefetchWhen(
                      (me) => isStaffRole(me.role),
                      () => void queryClient.prefetchQuery(rosterQueryOptions()),
                    ),
                  },
                  {
                    path: 'invitations',
                    lazy: page(() => import('./routes/coach-invitations'), 'CoachInvitationsRoute'),
                    loader: prefetchWhen(
                      (me) => me.role === 'owner' || me.role === 'coach',
                      () => void queryClient.prefetchQuery(invitationsQueryOptions()),
                    ),
                  },
                  {
                    path: 'api',
                    // No loader: its query module would land in the entry chunk the first routes load.
                    lazy: page(() => import('./routes/coach-api-reference'), 'CoachApiReferenceRoute'),
                  },
                  {
                    path: 'athletes/:athleteId',
                    lazy: page(() => import('./routes/coach-athlete'), 'CoachAthleteRoute'),
                    loader: ({ params }) =>
                      prefetchWhen(
                        (me) => isStaffRole(me.role),
                        () => void queryClient.prefetchQuery(athleteQueryOptions(params.athleteId ?? '')),
                      )(),
                  },
                  {
                    path: 'athletes/:athleteId/photos',
                    lazy: page(() => import('./routes/coach-athlete-photos'), 'CoachAthletePhotosRoute'),
                  },
                  {
                    path: 'athletes/:athleteId/body',
                    lazy: page(() => import('./routes/coach-athlete-body'), 'CoachAthleteBodyRoute'),
                    loader: ({ params }) =>
                      prefetchWhen(
                        (me) => isStaffRole(me.role),
                        () => {
                          void queryClient.prefetchQuery(athleteQueryOptions(params.athleteId ?? ''));
                          void queryClient.prefetchQuery(bodyCompositionQueryOptions(params.athleteId ?? ''));
                        },
                      )(),
                  },
                  {
                    path: 'athletes/:athleteId/weekly',
                    lazy: page(() => import('./routes/coach-athlete-weekly'), 'CoachAthleteWeeklyRoute'),
                  },
                  {
                    path: 'athletes/:athleteId/weekly/:checkInId',
                    lazy: page(() => import('./routes/coach-athlete-weekly'), 'CoachAthleteWeeklyRoute'),
                  },
                  {
                    path: 'athletes/:athleteId/trends',
                    lazy: page(() => import('./routes/coach-athlete-trends'), 'CoachAthleteTrendsRoute'),
                    loader: ({ params }) =>
                      prefetchWhen(
                        (me) => isStaffRole(me.role),
                        () => {
                          void queryClient.prefetchQuery(athleteQueryOptions(params.athleteId ?? ''));
                          void queryClient.prefetchQuery(marksQueryOptions(params.athleteId ?? ''));
                        },
                      )(),
                  },
                  {
                    path: 'athletes/:athleteId/plan',
                    lazy: page(() => import('./routes/coach-athlete-plan'), 'CoachAthletePlanLayout'),
                    loader: ({ params }) =>
                      prefetchWhen(
                        (me) => isStaffRole(me.role),
                        () => {
                          void queryClient.prefetchQuery(athleteQueryOptions(params.athleteId ?? ''));
                          void queryClient.prefetchQuery(planQueryOptions(params.athleteId ?? ''));
                        },
                      )(),
                    children: [
                      {
                        index: true,
                        lazy: page(
                          () => import('./routes/coach-athlete-plan'),
                          'CoachAthletePlanEditorRoute',
                        ),
                      },
                      {
                        path: 'countdown',
                        lazy: page(
                          () => import('./routes/coach-athlete-plan'),
                          'CoachAthletePlanCountdownRoute',
                        ),
                      },
                      {
                        path: 'history',
                        lazy: page(
                          () => import('./routes/coach-athlete-plan'),
                          'CoachAthletePlanHistoryRoute',
                        ),
                      },
                      {
                        path: 'history/:versionId',
                        lazy: page(
                          () => import('./routes/coach-athlete-plan'),
                          'CoachAthletePlanHistoryRoute',
                        ),
                      },
                    ],
                  },
                  {
                    path: 'foods/new',
                    lazy: page(() => import('./routes/coach-foods'), 'CoachFoodsRoute'),
                  },
                  {
                    path: 'templates',
                    lazy: page(() => import('./routes/coach-templates'), 'CoachTemplatesRoute'),
                    loader: prefetchWhen(
                      (me) => isStaffRole(me.role),
                      () => void queryClient.prefetchQuery(templatesQueryOptions()),
                    ),
                  },
                  {
                    path: 'templates/new',
                    lazy: page(() => import('./routes/coach-template'), 'CoachTemplateNewRoute'),
                  },
                  {
                    path: 'templates/:templateId',
                    lazy: page(() => import('./routes/coach-template'), 'CoachTemplateRoute'),
                    loader: ({ params }) =>
                      prefetchWhen(
                        (me) => isStaffRole(me.role),
                        () => void queryClient.prefetchQuery(templateQueryOptions(params.templateId ?? '')),
                      )(),
                  },
                  { path: '*', element: <NotFoundRoute /> },
                ],
              },
            ],
          },
          {
            element: <ShellForRole />,
            children: [{ path: 'settings', lazy: page(() => import('./routes/settings'), 'SettingsRoute') }],
          },
        ],
      },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
]);
