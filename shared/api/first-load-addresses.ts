import type { Address } from './endpoint';
import type { onlineBookingApi } from './online-booking.api';
import type { sessionApi } from './session.api';

/*
 * The endpoints a visitor's first load calls (the app frame's session and CSRF token, the public salon page),
 * written here apart from their schemas: a module the first load imports must not import zod's runtime, and a
 * bundler keeps a whole module with the chunk that first needs it. The contract modules spread these into their
 * endpoints, so each path is still written once.
 */
export const firstLoadPaths = {
  csrf: { method: 'get', path: '/api/csrf' },
  session: { method: 'get', path: '/api/session' },
  publicSalon: { method: 'get', path: '/api/public/salons/:slug' },
} as const;

/** The same, typed with their endpoints' inputs and answers for callApi and apiQuery (see Address). */
export const firstLoadAddresses = {
  csrf: firstLoadPaths.csrf as Address<typeof sessionApi.csrf>,
  session: firstLoadPaths.session as Address<typeof sessionApi.current>,
  publicSalon: firstLoadPaths.publicSalon as Address<typeof onlineBookingApi.publicSalon>,
};
