/** API paths shared by the server routes and the client's api-client, so neither side spells them twice. */
export const apiPaths = {
  health: '/api/health',
  openapi: '/api/openapi.json',
  csrf: '/api/csrf',
  session: '/api/session',
  signUp: '/api/sign-up',
  passwordReset: '/api/password-reset',
  passwordResetConfirm: '/api/password-reset/confirm',
  salon: '/api/salon',
  deskDay: '/api/desk/day',
  stylistDay: '/api/stylist/day',
  myBookings: '/api/me/bookings',
  ownerOverview: '/api/owner/overview',
  clients: '/api/clients',
  client: (id: string) => `/api/clients/${id}`,
  booking: (id: string) => `/api/bookings/${id}`,
  devMailbox: '/api/dev/mailbox',
} as const;
