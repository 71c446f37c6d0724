import { useQuery } from '@tanstack/react-query';
import { lazy, Suspense } from 'react';
import { Outlet, ScrollRestoration, useNavigation } from 'react-router-dom';
import { sessionQueries } from '../features/auth/api/session-queries';
import { ConnectionBanner } from './connection-banner';
import { SiteHeader } from './site-header';
import { StaffFooter } from './staff-footer';
import { usePageArrival } from './use-page-arrival';

// Staff only, and it brings the book's contracts with it: loaded once someone on the staff is signed in.
const LiveUpdatesBanner = lazy(() => import('./live-updates-banner').then((m) => ({ default: m.LiveUpdatesBanner })));
// Confirmations follow actions only signed-in people take: the toast package loads with the signed-in frame.
const Toasts = lazy(() => import('../components/ui/toasts').then((m) => ({ default: m.Toasts })));

/** The frame of every page: skip link, header, main, and for staff live updates and the cautions footer. */
export function RootLayout() {
  const { data: user } = useQuery(sessionQueries.current());
  const navigating = useNavigation().state === 'loading';
  usePageArrival();
  return (
    <div className="flex min-h-dvh flex-col">
      <a href="#main" className="sr-only rounded-lg bg-white px-4 py-2 font-bold focus:not-sr-only focus:absolute focus:left-4 focus:top-4 focus:z-50">
        Skip to content
      </a>
      <div aria-hidden="true" className={`h-1 bg-oxide transition-opacity ${navigating ? 'animate-pulse opacity-100' : 'opacity-0'}`} />
      <SiteHeader user={user ?? null} />
      <ConnectionBanner />
      {/* Keyed by the person: a new sign-in starts its own stream. */}
      {user && user.role !== 'client' && (
        <Suspense fallback={null}>
          <LiveUpdatesBanner key={user.id} />
        </Suspense>
      )}
      <main id="main" tabIndex={-1} aria-busy={navigating} className="mx-auto w-full max-w-7xl flex-1 px-4 py-6 sm:px-6">
        <Outlet />
      </main>
      {user && user.role !== 'client' && <StaffFooter />}
      {user && (
        <Suspense fallback={null}>
          <Toasts />
        </Suspense>
      )}
      <ScrollRestoration />
    </div>
  );
}
