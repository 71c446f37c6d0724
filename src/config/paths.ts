import type { Role } from '../../shared/schemas/common.schemas';

/** Route paths of the client, built in one place so links and the router agree. */
export const paths = {
  home: '/',
  signIn: (next?: string) => (next ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in'),
  signUp: (next?: string) => (next ? `/sign-up?next=${encodeURIComponent(next)}` : '/sign-up'),
  forgotPassword: '/forgot-password',
  resetPassword: '/reset-password',
  owner: '/owner',
  ownerUtilisation: '/owner/utilisation',
  deskUtilisation: '/desk/utilisation',
  ownerSetup: '/owner/setup',
  ownerSetupStaff: '/owner/setup/staff',
  ownerSetupUnits: '/owner/setup/chairs-and-basins',
  ownerSetupServices: '/owner/setup/services',
  ownerSetupService: (id: string) => `/owner/setup/services/${id}`,
  ownerQuotePrices: '/owner/setup/quote-prices',
  ownerFollowUps: '/owner/setup/follow-up-rules',
  desk: (date?: string) => (date ? `/desk?date=${date}` : '/desk'),
  deskClient: (id: string) => `/desk/clients/${id}`,
  outbox: '/desk/outbox',
  deskBook: (consultationId?: string) => (consultationId ? `/desk/book?consultation=${encodeURIComponent(consultationId)}` : '/desk/book'),
  deskBooking: (id: string) => `/desk/bookings/${id}`,
  deskStandby: '/desk/standby',
  deskWeek: (date?: string, stylistId?: string) => {
    const query = new URLSearchParams();
    if (date) query.set('date', date);
    if (stylistId) query.set('stylist', stylistId);
    const text = query.toString();
    return text ? `/desk/week?${text}` : '/desk/week';
  },
  offer: (token: string) => `/offer/${token}`,
  stylist: (date?: string) => (date ? `/stylist?date=${date}` : '/stylist'),
  mixLog: (bookingId: string, clientId?: string) =>
    `/stylist/bookings/${bookingId}/mix-log${clientId ? `?client=${encodeURIComponent(clientId)}` : ''}`,
  newConsultation: (clientId: string) => `/consultations/new?client=${encodeURIComponent(clientId)}`,
  consultation: (id: string) => `/consultations/${id}`,
  me: '/me',
  salon: (slug: string) => `/salon/${slug}`,
  salonBook: (slug: string, serviceId?: string) =>
    serviceId ? `/salon/${slug}/book?service=${encodeURIComponent(serviceId)}` : `/salon/${slug}/book`,
  bookingConfirmed: (id: string) => `/me/bookings/${id}/booked`,
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
