import type { Role } from '@shared/schemas/common.schemas';

/**
 * Every page of the client, in one place: `pages` holds the router's patterns and `paths` builds the
 * links to them from the same patterns, so a link cannot point where no route is.
 */
export const pages = {
  home: '/',
  signIn: '/sign-in',
  signUp: '/sign-up',
  forgotPassword: '/forgot-password',
  resetPassword: '/reset-password',
  owner: '/owner',
  ownerUtilisation: '/owner/utilisation',
  deskUtilisation: '/desk/utilisation',
  ownerSetup: '/owner/setup',
  ownerSetupStaff: '/owner/setup/staff',
  ownerSetupUnits: '/owner/setup/chairs-and-basins',
  ownerSetupServices: '/owner/setup/services',
  ownerSetupService: '/owner/setup/services/:id',
  ownerQuotePrices: '/owner/setup/quote-prices',
  ownerSetupProducts: '/owner/setup/products',
  ownerFollowUps: '/owner/setup/follow-up-rules',
  desk: '/desk',
  deskClient: '/desk/clients/:id',
  outbox: '/desk/outbox',
  deskBook: '/desk/book',
  deskBooking: '/desk/bookings/:id',
  /** Checkout when a visit ends (the hosted payment page sends the browser back here; the server writes it too). */
  deskCheckout: '/desk/bookings/:id/checkout',
  deskReceipt: '/desk/bookings/:id/receipt',
  deskStandby: '/desk/standby',
  deskWeek: '/desk/week',
  deskTakings: '/desk/takings',
  stylist: '/stylist',
  mixLog: '/stylist/bookings/:id/mix-log',
  newConsultation: '/consultations/new',
  consultation: '/consultations/:id',
  me: '/me',
  myHair: '/me/hair',
  bookingConfirmed: '/me/bookings/:id/booked',
  /** Where the payment provider's hosted page sends the client back after paying a held time (the server writes it too). */
  holdPaid: '/me/holds/:id/paid',
  salon: '/salon/:slug',
  salonBook: '/salon/:slug/book',
  offer: '/offer/:token',
  /** A deposit request's link, sent by SMS or e-mail (the server writes it too). */
  depositRequest: '/deposit/:token',
} as const;

/** A page's path with its `:params` filled (URL-encoded) and the non-empty query values appended. */
function to(pattern: string, params: Record<string, string> = {}, query: Record<string, string | undefined> = {}): string {
  const path = pattern.replace(/:(\w+)/g, (_m, name: string) => encodeURIComponent(params[name] ?? ''));
  const search = new URLSearchParams(Object.entries(query).filter((e): e is [string, string] => Boolean(e[1]))).toString();
  return search ? `${path}?${search}` : path;
}

/** Links to the pages above; the router and every link use these. */
export const paths = {
  home: pages.home,
  signIn: (next?: string) => to(pages.signIn, {}, { next }),
  signUp: (next?: string) => to(pages.signUp, {}, { next }),
  forgotPassword: pages.forgotPassword,
  resetPassword: pages.resetPassword,
  owner: pages.owner,
  ownerUtilisation: pages.ownerUtilisation,
  deskUtilisation: pages.deskUtilisation,
  ownerSetup: pages.ownerSetup,
  ownerSetupStaff: pages.ownerSetupStaff,
  ownerSetupUnits: pages.ownerSetupUnits,
  ownerSetupServices: pages.ownerSetupServices,
  ownerSetupService: (id: string) => to(pages.ownerSetupService, { id }),
  ownerQuotePrices: pages.ownerQuotePrices,
  ownerSetupProducts: pages.ownerSetupProducts,
  ownerFollowUps: pages.ownerFollowUps,
  desk: (date?: string) => to(pages.desk, {}, { date }),
  deskClient: (id: string) => to(pages.deskClient, { id }),
  outbox: pages.outbox,
  /** The day's takings and close; today in the salon when `date` is left out. */
  deskTakings: (date?: string) => to(pages.deskTakings, {}, { date }),
  /** Booking a consultation's saved quote, or a client (a service and stylist they asked for, e.g. from the standby list). */
  deskBook: (consultationId?: string, start?: { client: string; service?: string; stylist?: string }) =>
    to(pages.deskBook, {}, { consultation: consultationId, client: start?.client, service: start?.service, stylist: start?.stylist }),
  /** A booking's page; `move` opens its move form for that sitting, with free times from `from` (another day for a late client). */
  deskCheckout: (id: string) => to(pages.deskCheckout, { id }),
  deskReceipt: (id: string) => to(pages.deskReceipt, { id }),
  deskBooking: (id: string, move?: { sitting: number; from?: string }) =>
    to(pages.deskBooking, { id }, { sitting: move && String(move.sitting), from: move?.from }),
  deskStandby: pages.deskStandby,
  deskWeek: (date?: string, stylistId?: string) => to(pages.deskWeek, {}, { date, stylist: stylistId }),
  offer: (token: string) => to(pages.offer, { token }),
  stylist: (date?: string) => to(pages.stylist, {}, { date }),
  mixLog: (bookingId: string, clientId?: string) => to(pages.mixLog, { id: bookingId }, { client: clientId }),
  newConsultation: (clientId: string) => to(pages.newConsultation, {}, { client: clientId }),
  consultation: (id: string) => to(pages.consultation, { id }),
  me: pages.me,
  myHair: pages.myHair,
  salon: (slug: string) => to(pages.salon, { slug }),
  salonBook: (slug: string, serviceId?: string) => to(pages.salonBook, { slug }, { service: serviceId }),
  bookingConfirmed: (id: string) => to(pages.bookingConfirmed, { id }),
  holdPaid: (id: string) => to(pages.holdPaid, { id }),
  depositRequest: (token: string) => to(pages.depositRequest, { token }),
} as const;

/** The demo salon loaded by `npm start`; signed-out visitors get a link to its public page. */
export const demoSalonSlug = 'kestrel-and-pine';

/** The salon a same-site path belongs to, e.g. `/salon/kestrel-and-pine/book?…` → `kestrel-and-pine`. */
export function salonSlugOf(path: string | null): string | undefined {
  return path?.match(/^\/salon\/([a-z0-9-]{1,80})(?:[/?]|$)/)?.[1];
}

export function homeFor(role: Role): string {
  switch (role) {
    case 'owner':
      return paths.owner;
    case 'front_desk':
      return paths.desk();
    case 'stylist':
      return paths.stylist();
    case 'client':
      return paths.me;
  }
}

/** Only same-site paths may be a `next` target, so a crafted link cannot send people elsewhere. */
export function safeNext(next: string | null): string | null {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : null;
}
