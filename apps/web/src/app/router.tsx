import { createBrowserRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import { paths } from '../config/paths';
import { FullPageSpinner } from './layout/full-page-spinner';
import { RootLayout } from './layout/root-layout';
import { RouteErrorBoundary } from './route-error-boundary';

/** A lazily loaded page inside the organisation, with its own error boundary. */
function labRoute(path: string, lazy: NonNullable<RouteObject['lazy']>): RouteObject[] {
  return [{ path, lazy, ErrorBoundary: RouteErrorBoundary } as RouteObject];
}

/**
 * Every page is its own lazily loaded chunk; the shell, error boundary and spinner are the only
 * eager code. Each route has its own error boundary, so a failure in one page keeps the shell.
 */
export const routes: RouteObject[] = [
  {
    path: paths.root.pattern,
    Component: RootLayout,
    HydrateFallback: FullPageSpinner,
    ErrorBoundary: RouteErrorBoundary,
    children: [
      { index: true, lazy: () => import('./routes/index-route').then((m) => ({ Component: m.IndexRoute })), ErrorBoundary: RouteErrorBoundary },
      {
        lazy: () => import('./layout/auth-layout').then((m) => ({ Component: m.AuthLayout })),
        ErrorBoundary: RouteErrorBoundary,
        children: [
          { path: paths.signIn.pattern, lazy: () => import('./routes/sign-in-route').then((m) => ({ Component: m.SignInRoute })), ErrorBoundary: RouteErrorBoundary },
          { path: paths.signUp.pattern, lazy: () => import('./routes/sign-up-route').then((m) => ({ Component: m.SignUpRoute })), ErrorBoundary: RouteErrorBoundary },
          {
            path: paths.finishSignUp.pattern,
            lazy: () => import('./routes/finish-sign-up-route').then((m) => ({ Component: m.FinishSignUpRoute })),
            ErrorBoundary: RouteErrorBoundary,
          },
          {
            path: paths.forgotPassword.pattern,
            lazy: () => import('./routes/forgot-password-route').then((m) => ({ Component: m.ForgotPasswordRoute })),
            ErrorBoundary: RouteErrorBoundary,
          },
          {
            path: paths.resetPassword.pattern,
            lazy: () => import('./routes/reset-password-route').then((m) => ({ Component: m.ResetPasswordRoute })),
            ErrorBoundary: RouteErrorBoundary,
          },
          {
            path: paths.invitation.pattern,
            lazy: () => import('./routes/invitation-route').then((m) => ({ Component: m.InvitationRoute })),
            ErrorBoundary: RouteErrorBoundary,
          },
        ],
      },
      {
        path: paths.org.home.pattern,
        lazy: () => import('./layout/org-layout').then((m) => ({ Component: m.OrgLayout })),
        ErrorBoundary: RouteErrorBoundary,
        children: [
          { index: true, lazy: () => import('./routes/org-home-route').then((m) => ({ Component: m.OrgHomeRoute })), ErrorBoundary: RouteErrorBoundary },
          {
            path: paths.org.members.pattern,
            lazy: () => import('./routes/members-route').then((m) => ({ Component: m.MembersRoute })),
            ErrorBoundary: RouteErrorBoundary,
          },
          {
            path: paths.org.activity.pattern,
            lazy: () => import('./routes/activity-route').then((m) => ({ Component: m.ActivityRoute })),
            ErrorBoundary: RouteErrorBoundary,
          },
          ...labRoute(paths.org.projects.pattern, () => import('./routes/projects-route').then((m) => ({ Component: m.ProjectsRoute }))),
          ...labRoute(paths.org.project.pattern, () => import('./routes/project-route').then((m) => ({ Component: m.ProjectRoute }))),
          ...labRoute(paths.org.newGroundModel.pattern, () => import('./routes/ground-model-route').then((m) => ({ Component: m.GroundModelRoute }))),
          ...labRoute(paths.org.groundModel.pattern, () => import('./routes/ground-model-route').then((m) => ({ Component: m.GroundModelRoute }))),
          ...labRoute(paths.org.newCharacteristicSet.pattern, () => import('./routes/characteristic-set-route').then((m) => ({ Component: m.CharacteristicSetRoute }))),
          ...labRoute(paths.org.characteristicSet.pattern, () => import('./routes/characteristic-set-route').then((m) => ({ Component: m.CharacteristicSetRoute }))),
          ...labRoute(paths.org.settlementCheck.pattern, () => import('./routes/settlement-check-route').then((m) => ({ Component: m.SettlementCheckRoute }))),
          ...labRoute(paths.org.tests.pattern, () => import('./routes/tests-route').then((m) => ({ Component: m.TestsRoute }))),
          ...labRoute(paths.org.test.pattern, () => import('./routes/test-route').then((m) => ({ Component: m.TestRoute }))),
          ...labRoute(paths.org.reviewQueue.pattern, () => import('./routes/review-queue-route').then((m) => ({ Component: m.ReviewQueueRoute }))),
          ...labRoute(paths.org.soilRecords.pattern, () => import('./routes/soil-records-route').then((m) => ({ Component: m.SoilRecordsRoute }))),
          ...labRoute(paths.org.soilRecord.pattern, () => import('./routes/soil-record-route').then((m) => ({ Component: m.SoilRecordRoute }))),
          ...labRoute(paths.org.issuedTest.pattern, () => import('./routes/issued-test-route').then((m) => ({ Component: m.IssuedTestRoute }))),
          { path: '*', lazy: () => import('./routes/not-found-route').then((m) => ({ Component: m.NotFoundRoute })), ErrorBoundary: RouteErrorBoundary },
        ],
      },
      { path: '*', lazy: () => import('./routes/not-found-route').then((m) => ({ Component: m.NotFoundRoute })), ErrorBoundary: RouteErrorBoundary },
    ],
  },
];

const router = createBrowserRouter(routes);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
