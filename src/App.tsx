// Routes. Every screen but the farm list is loaded on demand: the forms' libraries (zod,
// react-hook-form) come with the sign-in and register screens, Leaflet with the maps.
import { QueryClientProvider } from '@tanstack/react-query';
import { createBrowserRouter, Navigate, RouterProvider } from 'react-router-dom';
import { Loading } from './components/ui/spinner';
import { RequireAuth } from './features/auth/components/require-auth';
import { SoilCheckSender } from './features/soils/offline/soil-check-sender';
import { paths } from './lib/paths';
import { queryClient } from './lib/query-client';
import { FarmsPage } from './pages/farms-page';
import { NotFoundPage } from './pages/not-found-page';

const router = createBrowserRouter([
  { path: paths.signIn.path, lazy: async () => ({ Component: (await import('./pages/sign-in-page')).SignInPage }) },
  { path: paths.register.path, lazy: async () => ({ Component: (await import('./pages/register-page')).RegisterPage }) },
  { path: paths.confirmAccount.path, lazy: async () => ({ Component: (await import('./pages/confirm-account-page')).ConfirmAccountPage }) },
  { path: paths.invitation.path, lazy: async () => ({ Component: (await import('./pages/accept-invitation-page')).AcceptInvitationPage }) },
  { path: paths.forgotPassword.path, lazy: async () => ({ Component: (await import('./pages/forgot-password-page')).ForgotPasswordPage }) },
  { path: paths.resetPassword.path, lazy: async () => ({ Component: (await import('./pages/reset-password-page')).ResetPasswordPage }) },
  { path: paths.devMailbox.path, lazy: async () => ({ Component: (await import('./pages/dev-mailbox-page')).DevMailboxPage }) },
  {
    element: <RequireAuth />,
    hydrateFallbackElement: <Loading />,
    children: [
      { path: paths.home.path, element: <Navigate to={paths.farms.getHref()} replace /> },
      { path: paths.farms.path, element: <FarmsPage /> },
      {
        path: paths.farmMap.path,
        lazy: async () => ({ Component: (await import('./pages/farm-map-page')).FarmMapPage }),
      },
      {
        path: paths.estimate.path,
        lazy: async () => ({ Component: (await import('./pages/estimate-page')).EstimatePage }),
      },
      {
        path: paths.field.path,
        lazy: async () => ({ Component: (await import('./pages/field-page')).FieldPage }),
      },
      {
        path: paths.board.path,
        lazy: async () => ({ Component: (await import('./pages/board-page')).BoardPage }),
      },
      {
        path: paths.budget.path,
        lazy: async () => ({ Component: (await import('./pages/budget-page')).BudgetPage }),
      },
      {
        path: paths.plan.path,
        lazy: async () => ({ Component: (await import('./pages/plan-page')).PlanPage }),
      },
      {
        path: paths.landownerPlan.path,
        lazy: async () => ({ Component: (await import('./pages/landowner-plan-page')).LandownerPlanPage }),
      },
      {
        path: paths.people.path,
        lazy: async () => ({ Component: (await import('./pages/people-page')).PeoplePage }),
      },
      {
        path: paths.account.path,
        lazy: async () => ({ Component: (await import('./pages/account-page')).AccountPage }),
      },
      {
        path: paths.clientBoard.path,
        lazy: async () => ({ Component: (await import('./pages/board-page')).ClientBoardPage }),
      },
    ],
  },
  { path: '*', element: <NotFoundPage /> },
]);

export function App() {
  return (
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
      <SoilCheckSender />
    </QueryClientProvider>
  );
}
