import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, Navigate, redirect, type LoaderFunction, type RouteObject } from 'react-router-dom';
import type { ComponentType } from 'react';
import { RootRouteError, RouteError } from '@/components/errors/route-error';
import { PageSpinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';

/** What a lazy route module exports: its page as `default`, and optionally a loader factory that gets the query client. */
interface RouteModule {
  default: ComponentType;
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
}

const convert =
  (queryClient: QueryClient) =>
  ({ default: Component, clientLoader }: RouteModule) => ({
    Component,
    ...(clientLoader ? { loader: clientLoader(queryClient) } : {}),
  });

/** The route tree; each page's code is loaded on first visit. */
export const createAppRoutes = (queryClient: QueryClient): RouteObject[] => [
  {
    path: paths.auth.signIn.path,
    lazy: () => import('./routes/auth/sign-in').then(convert(queryClient)),
    errorElement: <RootRouteError />,
    hydrateFallbackElement: <PageSpinner />,
  },
  {
    path: paths.auth.signUp.path,
    lazy: () => import('./routes/auth/sign-up').then(convert(queryClient)),
    errorElement: <RootRouteError />,
    hydrateFallbackElement: <PageSpinner />,
  },
  {
    path: paths.links.invite.path,
    lazy: () => import('./routes/invite').then(convert(queryClient)),
    errorElement: <RootRouteError />,
    hydrateFallbackElement: <PageSpinner />,
  },
  {
    path: paths.links.sharedTrip.path,
    lazy: () => import('./routes/shared-trip').then(convert(queryClient)),
    errorElement: <RootRouteError />,
    hydrateFallbackElement: <PageSpinner />,
  },
  {
    path: paths.home.path,
    lazy: () => import('./routes/app/root').then(convert(queryClient)),
    errorElement: <RootRouteError />,
    hydrateFallbackElement: <PageSpinner />,
    children: [
      {
        // Errors inside a page keep the navigation around them.
        errorElement: <RouteError />,
        children: [
          {
            index: true,
            loader: () => redirect(paths.app.locker.getHref()),
            element: <Navigate to={paths.app.locker.getHref()} replace />,
          },
          { path: paths.app.locker.path, lazy: () => import('./routes/app/locker').then(convert(queryClient)) },
          { path: paths.app.catalogue.path, lazy: () => import('./routes/app/catalogue').then(convert(queryClient)) },
          {
            path: paths.app.adminCatalogue.path,
            lazy: () => import('./routes/app/admin/catalogue').then(convert(queryClient)),
          },
          { path: paths.app.trips.path, lazy: () => import('./routes/app/trips').then(convert(queryClient)) },
          { path: paths.app.newTrip.path, lazy: () => import('./routes/app/trip-new').then(convert(queryClient)) },
          { path: paths.app.trip.path, lazy: () => import('./routes/app/trip-detail').then(convert(queryClient)) },
          { path: paths.app.editTrip.path, lazy: () => import('./routes/app/trip-edit').then(convert(queryClient)) },
          {
            path: paths.app.adminAccounts.path,
            lazy: () => import('./routes/app/admin/accounts').then(convert(queryClient)),
          },
          {
            path: paths.app.adminMail.path,
            lazy: () => import('./routes/app/admin/mail').then(convert(queryClient)),
          },
          { path: paths.app.outbox.path, lazy: () => import('./routes/app/outbox').then(convert(queryClient)) },
        ],
      },
    ],
  },
  {
    path: '*',
    lazy: () => import('./routes/not-found').then(convert(queryClient)),
    hydrateFallbackElement: <PageSpinner />,
  },
];

export const createAppRouter = (queryClient: QueryClient) => createBrowserRouter(createAppRoutes(queryClient));
