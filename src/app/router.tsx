import { createBrowserRouter, type RouteObject } from 'react-router';
import { ForgotPasswordRoute, ResetPasswordRoute, SignInRoute, SignUpRoute, VerifyRoute } from './routes/accounts';
import { homeLoader, HomeRoute } from './routes/home';
import { NotFoundRoute } from './routes/not-found';
import { RootErrorBoundary, RootFallback, rootLoader, RootRoute } from './routes/root';

/**
 * Every address the client knows. The account and admin screens load their code on first use,
 * since most visitors never open them.
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
      { path: '*', Component: NotFoundRoute },
    ],
  },
];

/** The browser router for the whole client. */
export const router = createBrowserRouter(routes);
