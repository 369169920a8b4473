import { isStaffRole, type Me } from '@driftmark/shared';
import { createBrowserRouter, Outlet, ScrollRestoration } from 'react-router';
import { athleteQueryOptions } from '@/features/athletes/api/get-athlete';
import { rosterQueryOptions } from '@/features/athletes/api/get-roster';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { dayQueryOptions } from '@/features/check-ins/api/get-day';
import { invitationsQueryOptions } from '@/features/invitations/api/get-invitations';
import { marksQueryOptions } from '@/features/marks/api/list-marks';
import { planQueryOptions } from '@/features/plans/api/get-plan';
import { templateQueryOptions } from '@/features/plans/api/get-template';
import { templatesQueryOptions } from '@/features/plans/api/get-templates';
import { reviewQueueQueryOptions } from '@/features/review/api/get-review-queue';
import { todayIn } from '@/lib/format';
import { queryClient } from '@/lib/query-client';
import { RequireAthlete, RequireSignedIn, RequireStaff } from './guards';
import { AthleteShell } from './layouts/athlete-shell';
import { ShellForRole } from './layouts/shell-for-role';
import { StaffShell } from './layouts/staff-shell';
import { AcceptInvitationRoute } from './routes/accept-invitation';
import { AthleteDayRoute } from './routes/athlete-day';
import { AthleteHistoryRoute } from './routes/athlete-history';
import { AthleteHomeRoute } from './routes/athlete-home';
import { AthletePhotosRoute } from './routes/athlete-photos';
import { AthleteTrendsRoute } from './routes/athlete-trends';
import { AthleteWeeklyRoute } from './routes/athlete-weekly';
import { CoachAthleteRoute } from './routes/coach-athlete';
import { CoachAthletePhotosRoute } from './routes/coach-athlete-photos';
import { CoachAthleteTrendsRoute } from './routes/coach-athlete-trends';
import { CoachAthleteWeeklyRoute } from './routes/coach-athlete-weekly';
import {
  CoachAthletePlanCountdownRoute,
  CoachAthletePlanEditorRoute,
  CoachAthletePlanHistoryRoute,
  CoachAthletePlanLayout,
} from './routes/coach-athlete-plan';
import { CoachInvitationsRoute } from './routes/coach-invitations';
import { CoachReviewQueueRoute } from './routes/coach-review-queue';
import { CoachRosterRoute } from './routes/coach-roster';
import { CoachTemplateNewRoute, CoachTemplateRoute } from './routes/coach-template';
import { CoachTemplatesRoute } from './routes/coach-templates';
import { DevInboxRoute } from './routes/dev-inbox';
import { ForgotPasswordRoute } from './routes/forgot-password';
import { IntakeRoute } from './routes/intake';
import { NotFoundRoute } from './routes/not-found';
import { ResetPasswordRoute } from './routes/reset-password';
import { RootRedirect } from './routes/root-redirect';
import { RouteError } from './routes/route-error';
import { SettingsRoute } from './routes/settings';
import { SignInRoute } from './routes/sign-in';
import { UnsubscribeRoute } from './routes/unsubscribe';
import { ReportWeekRoute } from './routes/report-week';
import { AccountDeleteRoute } from './routes/account-delete';

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

/** Today's screen: the profile and today's day (the athlete's own date) start loading together. */
const prefetchToday = prefetchWhen(
  (me) => me.role === 'athlete' && me.athleteId !== null,
  (me) => {
    void queryClient.prefetchQuery(athleteQueryOptions(me.athleteId!));
    void queryClient.prefetchQuery(dayQueryOptions(me.athleteId!, todayIn(me.timeZone)));
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
      { path: 'sign-in', element: <SignInRoute /> },
      { path: 'forgot-password', element: <ForgotPasswordRoute /> },
      { path: 'reset-password', element: <ResetPasswordRoute /> },
      { path: 'invite/:token', element: <AcceptInvitationRoute /> },
      { path: 'dev/inbox', element: <DevInboxRoute /> },
      { path: 'unsubscribe', element: <UnsubscribeRoute /> },
      { path: 'account/delete', element: <AccountDeleteRoute /> },
      {
        element: <RequireSignedIn />,
        children: [
          // Printable, outside the shells: the week before a check-in's due date.
          { path: 'report/athletes/:athleteId/weeks/:dueDate', element: <ReportWeekRoute /> },
          {
            element: <RequireAthlete />,
            children: [
              {
                element: <AthleteShell />,
                children: [
                  { path: 'athlete', element: <AthleteHomeRoute />, loader: prefetchToday },
                  { path: 'athlete/history', element: <AthleteHistoryRoute /> },
                  { path: 'athlete/days/:date', element: <AthleteDayRoute />, loader: prefetchOwnProfile },
                  { path: 'athlete/photos', element: <AthletePhotosRoute />, loader: prefetchOwnProfile },
                  { path: 'athlete/trends', element: <AthleteTrendsRoute />, loader: prefetchOwnTrends },
                  { path: 'athlete/weekly', element: <AthleteWeeklyRoute /> },
                  { path: 'intake', element: <IntakeRoute />, loader: prefetchOwnProfile },
                ],
              },
            ],
          },
          {
            path: 'coach',
            element: <RequireStaff />,
            children: [
              {
                element: <StaffShell />,
                children: [
                  {
                    index: true,
                    element: <CoachReviewQueueRoute />,
                    loader: prefetchWhen(
                      (me) => isStaffRole(me.role),
                      () => void queryClient.prefetchQuery(reviewQueueQueryOptions()),
                    ),
                  },
                  {
                    path: 'roster',
                    element: <CoachRosterRoute />,
                    loader: prefetchWhen(
                      (me) => isStaffRole(me.role),
                      () => void queryClient.prefetchQuery(rosterQueryOptions()),
                    ),
                  },
                  {
                    path: 'invitations',
                    element: <CoachInvitationsRoute />,
                    loader: prefetchWhen(
                      (me) => me.role === 'owner' || me.role === 'coach',
                      () => void queryClient.prefetchQuery(invitationsQueryOptions()),
                    ),
                  },
                  {
                    path: 'athletes/:athleteId',
                    element: <CoachAthleteRoute />,
                    loader: ({ params }) =>
                      prefetchWhen(
                        (me) => isStaffRole(me.role),
                        () => void queryClient.prefetchQuery(athleteQueryOptions(params.athleteId ?? '')),
                      )(),
                  },
                  { path: 'athletes/:athleteId/photos', element: <CoachAthletePhotosRoute /> },
                  { path: 'athletes/:athleteId/weekly', element: <CoachAthleteWeeklyRoute /> },
                  { path: 'athletes/:athleteId/weekly/:checkInId', element: <CoachAthleteWeeklyRoute /> },
                  {
                    path: 'athletes/:athleteId/trends',
                    element: <CoachAthleteTrendsRoute />,
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
                    element: <CoachAthletePlanLayout />,
                    loader: ({ params }) =>
                      prefetchWhen(
                        (me) => isStaffRole(me.role),
                        () => {
                          void queryClient.prefetchQuery(athleteQueryOptions(params.athleteId ?? ''));
                          void queryClient.prefetchQuery(planQueryOptions(params.athleteId ?? ''));
                        },
                      )(),
                    children: [
                      { index: true, element: <CoachAthletePlanEditorRoute /> },
                      { path: 'countdown', element: <CoachAthletePlanCountdownRoute /> },
                      { path: 'history', element: <CoachAthletePlanHistoryRoute /> },
                      { path: 'history/:versionId', element: <CoachAthletePlanHistoryRoute /> },
                    ],
                  },
                  {
                    path: 'templates',
                    element: <CoachTemplatesRoute />,
                    loader: prefetchWhen(
                      (me) => isStaffRole(me.role),
                      () => void queryClient.prefetchQuery(templatesQueryOptions()),
                    ),
                  },
                  { path: 'templates/new', element: <CoachTemplateNewRoute /> },
                  {
                    path: 'templates/:templateId',
                    element: <CoachTemplateRoute />,
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
            children: [{ path: 'settings', element: <SettingsRoute /> }],
          },
        ],
      },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
]);
