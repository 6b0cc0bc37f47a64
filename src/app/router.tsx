import { createBrowserRouter } from 'react-router';
import { PageLoading } from '@/components/ui/loading-state';
import { paths } from '@/config/paths';
import { ProtectedLayout } from '@/features/auth/components/protected-layout';
import { protectedLoader } from '@/features/auth/lib/route-guards';
import { RootLayout } from './routes/root-layout';
import { RouteError } from './routes/route-error';

/** One lazy module per screen keeps the first load small. */
export const router = createBrowserRouter([
  {
    element: <RootLayout />,
    errorElement: <RouteError />,
    // Shown while the first screen's loaders run (e.g. who is signed in).
    hydrateFallbackElement: <PageLoading />,
    children: [
      { path: paths.signIn.path, lazy: () => import('./routes/sign-in').then((m) => ({ Component: m.SignInRoute, loader: m.signInLoader })) },
      { path: paths.signUp.path, lazy: () => import('./routes/sign-up').then((m) => ({ Component: m.SignUpRoute, loader: m.signUpLoader })) },
      { path: paths.forgotPassword.path, lazy: () => import('./routes/forgot-password').then((m) => ({ Component: m.ForgotPasswordRoute })) },
      { path: paths.resetPassword.path, lazy: () => import('./routes/reset-password').then((m) => ({ Component: m.ResetPasswordRoute })) },
      { path: paths.acceptInvitation.path, lazy: () => import('./routes/accept-invitation').then((m) => ({ Component: m.AcceptInvitationRoute })) },
      {
        // Every signed-in screen goes in here: the loader sends a signed-out visitor to sign-in and back.
        loader: protectedLoader,
        element: <ProtectedLayout />,
        errorElement: <RouteError />,
        children: [
          { path: paths.home.path, lazy: () => import('./routes/home').then((m) => ({ Component: m.HomeRoute })) },
          { path: paths.account.path, lazy: () => import('./routes/account').then((m) => ({ Component: m.AccountRoute })) },
          { path: paths.studio.path, lazy: () => import('./routes/studio').then((m) => ({ Component: m.StudioRoute, loader: m.studioLoader })) },
          {
            path: paths.studioInvitations.path,
            lazy: () => import('./routes/studio-invitations').then((m) => ({ Component: m.StudioInvitationsRoute, loader: m.studioInvitationsLoader })),
          },
          { path: paths.studioMail.path, lazy: () => import('./routes/studio-mail').then((m) => ({ Component: m.StudioMailRoute, loader: m.studioMailLoader })) },
          {
            path: paths.studioMailMessage.path,
            lazy: () => import('./routes/studio-mail-message').then((m) => ({ Component: m.StudioMailMessageRoute, loader: m.studioMailMessageLoader })),
          },
          { path: paths.clients.path, lazy: () => import('./routes/clients').then((m) => ({ Component: m.ClientsRoute })) },
          { path: paths.client.path, lazy: () => import('./routes/client').then((m) => ({ Component: m.ClientRoute, loader: m.clientLoader })) },
          { path: paths.fitting.path, lazy: () => import('./routes/fitting').then((m) => ({ Component: m.FittingRoute, loader: m.fittingLoader })) },
          { path: paths.fabrics.path, lazy: () => import('./routes/fabrics').then((m) => ({ Component: m.FabricsRoute })) },
          { path: paths.fabricNew.path, lazy: () => import('./routes/fabrics-detail').then((m) => ({ Component: m.FabricNewRoute })) },
          { path: paths.fabric.path, lazy: () => import('./routes/fabrics-detail').then((m) => ({ Component: m.FabricRoute, loader: m.fabricLoader })) },
          { path: paths.drafts.path, lazy: () => import('./routes/drafts').then((m) => ({ Component: m.DraftsRoute, loader: m.draftsLoader })) },
          { path: paths.draftNew.path, lazy: () => import('./routes/draft-new').then((m) => ({ Component: m.DraftNewRoute })) },
          { path: paths.draft.path, lazy: () => import('./routes/draft').then((m) => ({ Component: m.DraftRoute, loader: m.draftLoader })) },
          { path: paths.queue.path, lazy: () => import('./routes/queue').then((m) => ({ Component: m.QueueRoute, loader: m.queueLoader })) },
        ],
      },
      { path: '*', lazy: () => import('./routes/not-found').then((m) => ({ Component: m.NotFoundRoute })) },
    ],
  },
]);
