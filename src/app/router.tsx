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
      { path: 'tours/:tourId', lazy: () => import('./routes/tour').then((m) => ({ Component: m.TourRoute, loader: m.watchLoader })) },
      { path: 'tours/:tourId/stops/:stopId', lazy: () => import('./routes/tour').then((m) => ({ Component: m.TourRoute, loader: m.watchLoader })) },
      { path: 'tours/:tourId/edit', lazy: () => import('./routes/tour').then((m) => ({ Component: m.TourEditRoute, loader: m.tourLoader })) },
      { path: 'tours/:tourId/captions', lazy: () => import('./routes/tour-captions').then((m) => ({ Component: m.TourCaptionsRoute, loader: m.tourCaptionsLoader })) },
      { path: 'tours/:tourId/transcript', lazy: () => import('./routes/tour-transcript').then((m) => ({ Component: m.TourTranscriptRoute, loader: m.tourTranscriptLoader })) },
      { path: 'my/tours', lazy: () => import('./routes/my-tours').then((m) => ({ Component: m.MyToursRoute })) },
      { path: 'finder', lazy: () => import('./routes/finder').then((m) => ({ Component: m.FinderRoute })) },
      { path: 'compare', lazy: () => import('./routes/compare').then((m) => ({ Component: m.CompareRoute, loader: m.compareLoader })) },
      { path: 'learn', lazy: () => import('./routes/learn').then((m) => ({ Component: m.LearnRoute })) },
      { path: 'cultivars', lazy: () => import('./routes/cultivars').then((m) => ({ Component: m.CultivarIndexRoute, loader: m.cultivarIndexLoader })) },
      { path: 'cultivars/new', lazy: () => import('./routes/cultivars').then((m) => ({ Component: m.NewCultivarRoute })) },
      { path: 'cultivars/:slug', lazy: () => import('./routes/cultivars').then((m) => ({ Component: m.CultivarRoute, loader: m.cultivarLoader })) },
      { path: 'glossary', lazy: () => import('./routes/glossary').then((m) => ({ Component: m.GlossaryRoute, loader: m.glossaryLoader })) },
      { path: 'moderation/spelling', lazy: () => import('./routes/spelling').then((m) => ({ Component: m.SpellingQueueRoute })) },
      { path: 'tours/:tourId/names', lazy: () => import('./routes/spelling').then((m) => ({ Component: m.TourNamesRoute })) },
      { path: 'search', lazy: () => import('./routes/search').then((m) => ({ Component: m.SearchRoute, loader: m.searchLoader })) },
      { path: 'authors/:authorId', lazy: () => import('./routes/author').then((m) => ({ Component: m.AuthorRoute, loader: m.authorLoader })) },
      { path: '*', Component: NotFoundRoute },
    ],
  },
];

/** The browser router for the whole client. */
export const router = createBrowserRouter(routes);
