import { createBrowserRouter, redirect, type LoaderFunctionArgs, type RouteObject } from 'react-router-dom';
import type { Role } from '@shared/schemas/common.schemas';
import { DESK, STAFF } from '@shared/api/endpoint';
import { homeFor, pages, paths } from '../config/paths';
import { LoadingState } from '../components/ui/loading-state';
import { currentUser, requireRole } from './require-role';
import { RootLayout } from './root-layout';
import { RouteError } from './route-error';

/** What each lazily loaded page module exports. */
type PageModule = {
  Component: React.ComponentType;
  loader?: (args: LoaderFunctionArgs) => Promise<unknown>;
};

/** A page anyone may open; its code loads only when it is visited. Patterns are written from the root. */
function page(pattern: string, load: () => Promise<PageModule>): RouteObject {
  return {
    path: pattern.replace(/^\//, ''),
    errorElement: <RouteError />,
    lazy: async () => {
      const { Component, loader } = await load();
      return { Component, loader: loader ?? (() => null) };
    },
  };
}

/** A page for some roles only: the same rule the server applies to the page's API calls. */
function rolePage(pattern: string, roles: readonly Role[], load: () => Promise<PageModule>): RouteObject {
  return {
    path: pattern.replace(/^\//, ''),
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
        // Only sends the visitor on to their home; the element shows while it decides.
        index: true,
        element: <LoadingState />,
        loader: async () => {
          const user = await currentUser();
          return redirect(user ? homeFor(user.role) : paths.signIn());
        },
      },
      page(pages.signIn, () => import('./routes/sign-in')),
      page(pages.signUp, () => import('./routes/sign-up')),
      page(pages.forgotPassword, () => import('./routes/forgot-password')),
      page(pages.resetPassword, () => import('./routes/reset-password')),
      rolePage(pages.owner, ['owner'], () => import('./routes/owner-home')),
      rolePage(pages.ownerUtilisation, ['owner'], () => import('./routes/owner-utilisation')),
      rolePage(pages.deskUtilisation, DESK, () => import('./routes/desk-utilisation')),
      rolePage(pages.ownerSetup, ['owner'], () => import('./routes/owner-setup-salon')),
      rolePage(pages.ownerSetupStaff, ['owner'], () => import('./routes/owner-setup-staff')),
      rolePage(pages.ownerSetupUnits, ['owner'], () => import('./routes/owner-setup-units')),
      rolePage(pages.ownerSetupServices, ['owner'], () => import('./routes/owner-setup-services')),
      rolePage(pages.ownerSetupService, ['owner'], () => import('./routes/owner-setup-service')),
      rolePage(pages.ownerQuotePrices, ['owner'], () => import('./routes/owner-quote-prices')),
      rolePage(pages.ownerSetupProducts, ['owner'], () => import('./routes/owner-setup-products')),
      rolePage(pages.ownerFollowUps, ['owner'], () => import('./routes/owner-follow-ups')),
      rolePage(pages.desk, DESK, () => import('./routes/desk-home')),
      rolePage(pages.deskClient, DESK, () => import('./routes/desk-client')),
      rolePage(pages.outbox, DESK, () => import('./routes/outbox')),
      rolePage(pages.deskTakings, DESK, () => import('./routes/desk-takings')),
      rolePage(pages.deskBook, DESK, () => import('./routes/desk-book')),
      rolePage(pages.deskBooking, DESK, () => import('./routes/desk-booking')),
      rolePage(pages.deskCheckout, DESK, () => import('./routes/desk-checkout')),
      rolePage(pages.deskReceipt, DESK, () => import('./routes/desk-receipt')),
      rolePage(pages.deskStandby, DESK, () => import('./routes/desk-standby')),
      rolePage(pages.deskWeek, DESK, () => import('./routes/desk-week')),
      rolePage(pages.stylist, ['stylist'], () => import('./routes/stylist-home')),
      rolePage(pages.mixLog, ['stylist'], () => import('./routes/stylist-mix-log')),
      rolePage(pages.newConsultation, STAFF, () => import('./routes/consultation-new')),
      rolePage(pages.consultation, STAFF, () => import('./routes/consultation')),
      rolePage(pages.me, ['client'], () => import('./routes/client-home')),
      rolePage(pages.myHair, ['client'], () => import('./routes/client-hair')),
      rolePage(pages.bookingConfirmed, ['client'], () => import('./routes/booking-booked')),
      rolePage(pages.holdPaid, ['client'], () => import('./routes/hold-paid')),
      page(pages.salon, () => import('./routes/public-salon')),
      page(pages.salonBook, () => import('./routes/online-booking')),
      page(pages.offer, () => import('./routes/offer')),
      page(pages.depositRequest, () => import('./routes/deposit-request')),
      page('*', () => import('./routes/not-found')),
    ],
  },
];

export const router = createBrowserRouter(routes);
