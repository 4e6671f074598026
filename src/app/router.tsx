import { createBrowserRouter, type RouteObject } from 'react-router';
import { ForgotPasswordRoute, ResetPasswordRoute, SignInRoute, SignUpRoute, VerifyRoute } from './routes/accounts';
import { homeLoader, HomeRoute } from './routes/home';
import { NotFoundRoute } from './routes/not-found';
import { RootErrorBoundary, RootFallback, rootLoader, RootRoute } from './routes/root';

/**
 * Every address the client knows. The account, admin and tour screens load their code on first
 * use, and the video player and the description editor load later still, inside their pages.
 */
export const routes: RouteObject[] = [
  {
    path: '/',
    Component: RootRoute,
    ErrorBoundary: RootErrorBoundary,
    HydrateFallback: RootFallback,
    loader: rootLoader,
    children: [
      { index: true, Component: HomeRoute, loader: homeLoader },
      { path: 'sign-in', Component: SignInRoute },
      { path: 'sign-up', Component: SignUpRoute },
      { path: 'verify', Component: VerifyRoute },
      { path: 'forgot-password', Component: ForgotPasswordRoute },
      { path: 'reset-password', Component: ResetPasswordRoute },
      { path: 'account', lazy: () => import('./routes/account').then((m) => ({ Component: m.AccountRoute })) },
      {
        path: 'admin/users',
        lazy: () => import('./routes/admin-users').then((m) => ({ Component: m.AdminUsersRoute, loader: m.adminUsersLoader })),
      },
      { path: 'admin/outbox', lazy: () => import('./routes/admin-outbox').then((m) => ({ Component: m.AdminOutboxRoute })) },
      { path: 'tours', lazy: () => import('./routes/tours').then((m) => ({ Component: m.ToursRoute, loader: m.toursLoader })) },
      { path: 'tours/new', lazy: () => import('./routes/tour-new').then((m) => ({ Component: m.NewTourRoute })) },
      { path: 'tours/:tourId', lazy: () => import('./routes/tour').then((m) => ({ Component: m.TourRoute, loader: m.tourLoader })) },
      { path: 'tours/:tourId/edit', lazy: () => import('./routes/tour').then((m) => ({ Component: m.TourEditRoute, loader: m.tourLoader })) },
      { path: 'my/tours', lazy: () => import('./routes/my-tours').then((m) => ({ Component: m.MyToursRoute })) },
      { path: 'finder', lazy: () => import('./routes/finder').then((m) => ({ Component: m.FinderRoute })) },
      { path: 'compare', lazy: () => import('./routes/compare').then((m) => ({ Component: m.CompareRoute, loader: m.compareLoader })) },
      { path: 'learn', lazy: () => import('./routes/learn').then((m) => ({ Component: m.LearnRoute })) },
      { path: '*', Component: NotFoundRoute },
    ],
  },
];

/** The browser router for the whole client. */
export const router = createBrowserRouter(routes);
