import type { Role } from '../../../shared/schemas/common.schemas';

/**
 * Who may call each route of the OpenAPI document, written out by hand so the matrix test checks the
 * code against an independent statement. One line per route; a route missing here fails the test.
 *
 * - `allow`: 'anyone', 'signed_in', or the roles allowed.
 * - `own: true`: the ids in the path belong to one client (their booking, card, photo, standby entry).
 *   That client and their salon's allowed staff get through; another client of the salon and staff of
 *   another salon are refused (404 on reads, never 2xx on writes) even though their role is allowed.
 */
export interface Expectation {
  allow: 'anyone' | 'signed_in' | readonly Role[];
  own?: true;
}

const STAFF = ['front_desk', 'stylist', 'owner'] as const;
const DESK = ['front_desk', 'owner'] as const;
const CLIENT_OR_STAFF = ['client', ...STAFF] as const;

export const expectedAccess: Record<string, Expectation> = {
  'GET /api/csrf': { allow: 'anyone' },
  'GET /api/health': { allow: 'anyone' },
  'POST /api/session': { allow: 'anyone' },
  'GET /api/session': { allow: 'signed_in' },
  'DELETE /api/session': { allow: 'anyone' },
  'POST /api/sign-up': { allow: 'anyone' },
  'POST /api/password-reset': { allow: 'anyone' },
  'POST /api/password-reset/confirm': { allow: 'anyone' },
  'GET /api/salon': { allow: 'signed_in' },
  'GET /api/desk/day': { allow: DESK },
  'GET /api/desk/week': { allow: DESK },
  'GET /api/stylist/day': { allow: ['stylist'] },
  'GET /api/me/bookings': { allow: ['client'] },
  'GET /api/bookings/{id}': { allow: 'signed_in', own: true },
  'POST /api/booking-options': { allow: DESK },
  'POST /api/bookings': { allow: DESK },
  'POST /api/bookings/{id}/move': { allow: DESK, own: true },
  'POST /api/bookings/{id}/cancel': { allow: DESK, own: true },
  'GET /api/bookings/{id}/history': { allow: DESK, own: true },
  'GET /api/services': { allow: STAFF },
  'GET /api/stylists': { allow: STAFF },
  'GET /api/clients/{id}/skin-tests': { allow: STAFF, own: true },
  'POST /api/clients/{id}/skin-tests': { allow: STAFF, own: true },
  'POST /api/clients/{id}/skin-tests/{testId}/reading': { allow: STAFF, own: true },
  'POST /api/clients/{id}/skin-test-clearances': { allow: ['owner'], own: true },
  'GET /api/standby': { allow: STAFF },
  'POST /api/standby': { allow: DESK },
  'DELETE /api/standby/{id}': { allow: DESK, own: true },
  'GET /api/windows': { allow: STAFF },
  'POST /api/windows/fill': { allow: STAFF },
  'POST /api/windows/offer': { allow: STAFF },
  'GET /api/offers/{token}': { allow: 'anyone' },
  'POST /api/offers/{token}/accept': { allow: 'anyone' },
  'GET /api/public/salons/{slug}': { allow: 'anyone' },
  'GET /api/public/salons/{slug}/availability': { allow: 'anyone' },
  'POST /api/public/holds': { allow: 'anyone' },
  'GET /api/public/holds/{id}': { allow: 'anyone' },
  'POST /api/me/holds/{id}/claim': { allow: ['client'] },
  'POST /api/me/holds/{id}/cautions': { allow: ['client'] },
  'POST /api/me/holds/{id}/pay': { allow: ['client'] },
  'GET /api/me/bookings/{id}/cancel-terms': { allow: ['client'], own: true },
  'POST /api/me/bookings/{id}/cancel': { allow: ['client'], own: true },
  'GET /api/me/bookings/{id}/move-times': { allow: ['client'], own: true },
  'POST /api/me/bookings/{id}/move': { allow: ['client'], own: true },
  'GET /api/clients': { allow: STAFF },
  'POST /api/clients': { allow: DESK },
  'GET /api/clients/{id}': { allow: STAFF, own: true },
  'GET /api/owner/overview': { allow: ['owner'] },
  'GET /api/messages': { allow: DESK },
  'GET /api/dev/mailbox': { allow: DESK },
  'GET /api/dev/sms': { allow: DESK },
  'GET /api/me/hair-history': { allow: ['client'] },
  'PUT /api/me/hair-history': { allow: ['client'] },
  'GET /api/clients/{id}/hair-history': { allow: CLIENT_OR_STAFF, own: true },
  'PUT /api/clients/{id}/hair-history': { allow: CLIENT_OR_STAFF, own: true },
  'POST /api/me/photos': { allow: ['client'] },
  'POST /api/clients/{id}/photos': { allow: STAFF, own: true },
  'GET /api/me/photos': { allow: ['client'] },
  'GET /api/clients/{id}/photos': { allow: CLIENT_OR_STAFF, own: true },
  'GET /api/photos/{id}': { allow: CLIENT_OR_STAFF, own: true },
  'DELETE /api/photos/{id}': { allow: CLIENT_OR_STAFF, own: true },
  'GET /api/bookings/{id}/mix-logs': { allow: STAFF, own: true },
  'POST /api/bookings/{id}/mix-logs': { allow: STAFF, own: true },
  'POST /api/bookings/{id}/mix-logs/repeat': { allow: STAFF, own: true },
  // Utilisation: the owner sees everything; the desk a subset without money.
  'GET /api/owner/utilisation': { allow: ['owner'] },
  'GET /api/owner/utilisation/scenario': { allow: ['owner'] },
  'GET /api/desk/utilisation': { allow: DESK },
  // Set-up is the owner's alone.
  'GET /api/owner/setup/salon': { allow: ['owner'] },
  'PUT /api/owner/setup/salon': { allow: ['owner'] },
  'GET /api/owner/setup/staff': { allow: ['owner'] },
  'POST /api/owner/setup/staff': { allow: ['owner'] },
  'PUT /api/owner/setup/staff/{id}': { allow: ['owner'] },
  'GET /api/owner/setup/staff/{id}/future-bookings': { allow: ['owner'] },
  'POST /api/owner/setup/staff/{id}/time-off': { allow: ['owner'] },
  'DELETE /api/owner/setup/staff/{id}/time-off/{entryId}': { allow: ['owner'] },
  'POST /api/owner/setup/staff/{id}/reassign': { allow: ['owner'] },
  'POST /api/owner/setup/staff/{id}/deactivate': { allow: ['owner'] },
  'GET /api/owner/setup/units': { allow: ['owner'] },
  'POST /api/owner/setup/units/{kind}': { allow: ['owner'] },
  'PUT /api/owner/setup/units/{kind}/{id}': { allow: ['owner'] },
  'GET /api/owner/setup/units/{kind}/{id}/affected': { allow: ['owner'] },
  'POST /api/owner/setup/units/{kind}/{id}/out-of-service': { allow: ['owner'] },
  'DELETE /api/owner/setup/units/{kind}/{id}/out-of-service/{entryId}': { allow: ['owner'] },
  'GET /api/owner/setup/services': { allow: ['owner'] },
  'POST /api/owner/setup/services': { allow: ['owner'] },
  'PUT /api/owner/setup/services/{id}': { allow: ['owner'] },
  'DELETE /api/owner/setup/services/{id}': { allow: ['owner'] },
  'GET /api/owner/quote-prices': { allow: ['owner'] },
  'PUT /api/owner/quote-prices': { allow: ['owner'] },
  'GET /api/owner/follow-up-rules': { allow: ['owner'] },
  'POST /api/owner/follow-up-rules': { allow: ['owner'] },
  'PUT /api/owner/follow-up-rules/{id}': { allow: ['owner'] },
  'DELETE /api/owner/follow-up-rules/{id}': { allow: ['owner'] },
  // Consultations and test records: the salon's staff; a client sees only quotes sent to them.
  'POST /api/consultations/propose': { allow: STAFF },
  'POST /api/consultations': { allow: STAFF },
  'GET /api/consultations/{id}': { allow: STAFF },
  'PUT /api/consultations/{id}/quote': { allow: STAFF },
  'POST /api/consultations/{id}/quote/send': { allow: STAFF },
  'GET /api/clients/{id}/consultations': { allow: STAFF, own: true },
  'GET /api/me/quotes': { allow: ['client'] },
  'POST /api/me/quotes/{id}/accept': { allow: ['client'] },
  'GET /api/clients/{id}/strand-tests': { allow: STAFF, own: true },
  'POST /api/clients/{id}/strand-tests': { allow: STAFF, own: true },
  // Messages: the desk edits a card's contact preferences; a client their own; the provider's webhook is
  // public but checks the provider's signature.
  'PATCH /api/clients/{id}': { allow: DESK, own: true },
  'GET /api/me/preferences': { allow: ['client'] },
  'PUT /api/me/preferences': { allow: ['client'] },
  'POST /webhooks/sms': { allow: 'anyone' },
  'POST /api/dev/sms/inbound': { allow: DESK },
};
