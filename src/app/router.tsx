import { createBrowserRouter, redirect, type LoaderFunctionArgs, type RouteObject } from 'react-router-dom';
import type { Role } from '../../shared/schemas/common.schemas';
import { homeFor, paths } from '../config/paths';
import { LoadingState } from '../components/ui/loading-state';
import { currentUser, requireRole } from './require-role';
import { RootLayout } from './root-layout';
import { RouteError } from './route-error';

/** What each lazily loaded page module exports. */
type PageModule = {
  Component: React.ComponentType;
  loader?: (args: LoaderFunctionArgs) => Promise<unknown>;
};

/** A page anyone may open; its code loads only when it is visited. */
function page(path: string, load: () => Promise<PageModule>): RouteObject {
  return {
    path,
    errorElement: <RouteError />,
    lazy: async () => {
      const { Component, loader } = await load();
      return { Component, loader: loader ?? (() => null) };
    },
  };
}

/** A page for some roles only: the same rule the server applies to the page's API calls. */
function rolePage(path: string, roles: readonly Role[], load: () => Promise<PageModule>): RouteObject {
  return {
    path,
    errorElement: <RouteError />,
    lazy: async () => {
      const { Component, loader } = await load();
      return {
        Component,
        loader: async (args: LoaderFunctionArgs) => {
          await requireRole(args.request, roles);
          return loader ? loader(args) : null;
        },
      };
    },
  };
}

const routes: RouteObject[] = [
  {
    id: 'root',
    element: <RootLayout />,
    loader: () => currentUser(),
    HydrateFallback: () => <LoadingState />,
    errorElement: <RouteError />,
    children: [
      {
        index: true,
        loader: async () => {
          const user = await currentUser();
          return redirect(user ? homeFor(user.role) : paths.signIn());
        },
      },
      page('sign-in', () => import('./routes/sign-in')),
      page('sign-up', () => import('./routes/sign-up')),
      page('forgot-password', () => import('./routes/forgot-password')),
      page('reset-password', () => import('./routes/reset-password')),
      rolePage('owner', ['owner'], () => import('./routes/owner-home')),
      rolePage('owner/utilisation', ['owner'], () => import('./routes/owner-utilisation')),
      rolePage('desk/utilisation', ['front_desk', 'owner'], () => import('./routes/desk-utilisation')),
      rolePage('owner/setup', ['owner'], () => import('./routes/owner-setup-salon')),
      rolePage('owner/setup/staff', ['owner'], () => import('./routes/owner-setup-staff')),
      rolePage('owner/setup/chairs-and-basins', ['owner'], () => import('./routes/owner-setup-units')),
      rolePage('owner/setup/services', ['owner'], () => import('./routes/owner-setup-services')),
      rolePage('owner/setup/services/:id', ['owner'], () => import('./routes/owner-setup-service')),
      rolePage('owner/setup/quote-prices', ['owner'], () => import('./routes/owner-quote-prices')),
      rolePage('owner/setup/follow-up-rules', ['owner'], () => import('./routes/owner-follow-ups')),
      rolePage('desk', ['front_desk', 'owner'], () => import('./routes/desk-home')),
      rolePage('desk/clients/:id', ['front_desk', 'owner'], () => import('./routes/desk-client')),
      rolePage('desk/outbox', ['front_desk', 'owner'], () => import('./routes/outbox')),
      rolePage('desk/book', ['front_desk', 'owner'], () => import('./routes/desk-book')),
      rolePage('desk/bookings/:id', ['front_desk', 'owner'], () => import('./routes/desk-booking')),
      rolePage('desk/standby', ['front_desk', 'owner'], () => import('./routes/desk-standby')),
      rolePage('desk/week', ['front_desk', 'owner'], () => import('./routes/desk-week')),
      rolePage('stylist', ['stylist'], () => import('./routes/stylist-home')),
      rolePage('stylist/bookings/:id/mix-log', ['stylist'], () => import('./routes/stylist-mix-log')),
      rolePage('consultations/new', ['stylist', 'front_desk', 'owner'], () => import('./routes/consultation-new')),
      rolePage('consultations/:id', ['stylist', 'front_desk', 'owner'], () => import('./routes/consultation')),
      rolePage('me', ['client'], () => import('./routes/client-home')),
      rolePage('me/hair', ['client'], () => import('./routes/client-hair')),
      rolePage('me/bookings/:id/booked', ['client'], () => import('./routes/booking-booked')),
      page('salon/:slug', () => import('./routes/public-salon')),
      page('salon/:slug/book', () => import('./routes/online-booking')),
      page('offer/:token', () => import('./routes/offer')),
      page('*', () => import('./routes/not-found')),
    ],
  },
];

export const router = createBrowserRouter(routes);
