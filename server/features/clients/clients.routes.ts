import { apiPaths } from '../../../shared/api/api-paths';
import { ClientDetailSchema, ClientListQuerySchema, ClientListSchema, ClientSummarySchema } from '../../../shared/schemas/client.schemas';
import { CreateClientSchema } from '../../../shared/schemas/booking.schemas';
import { BookingStatusSchema, IdParamsSchema } from '../../../shared/schemas/common.schemas';
import type { AppDeps } from '../../app-deps';
import { DESK, STAFF } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { findHairHistory } from '../hair-history/hair-history.repository';
import { notFound } from '../../lib/app-error';
import { findSalon, salonCountry } from '../salon/salon.repository';
import { storedPhone } from '../../lib/stored-phone';
import { loadBookingViews } from '../bookings/booking-views.repository';
import { findClient, insertClient, searchClients, updateClientContact } from './clients.repository';
import { UpdateClientSchema } from '../../../shared/schemas/contact.schemas';
import { replanClientMessages } from '../messages/plan-messages.service';

export function registerClientRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: apiPaths.clients, access: STAFF, summary: 'Find clients by name, e-mail or phone', query: ClientListQuerySchema, response: ClientListSchema },
    async ({ user, query }) => ({ clients: await searchClients(db, user.salonId, query.q) }),
  );
  apiRoute(
    table,
    { method: 'post', path: apiPaths.clients, access: DESK, summary: 'Add a client (e.g. at the desk while booking)', body: CreateClientSchema, response: ClientSummarySchema, status: 201 },
    async ({ user, body }) => {
      const client = { name: body.name, email: body.email || null, phone: storedPhone(body.phone ?? null, await salonCountry(db, user.salonId)) };
      const id = await insertClient(db, { salonId: user.salonId, userId: null, ...client, notes: body.notes });
      return { id, ...client };
    },
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/clients/:id', access: STAFF, summary: 'A client card with their bookings', params: IdParamsSchema, response: ClientDetailSchema },
    async ({ user, params }) => {
      const client = await findClient(db, user.salonId, params.id);
      if (!client) throw notFound('That client');
      const salon = await findSalon(db, user.salonId);
      const bookings = await loadBookingViews(
        db,
        { salonId: salon.id, clientId: client.id, statuses: BookingStatusSchema.options },
        salon.timeZone,
      );
      const reaction = (await findHairHistory(db, client.id)).answers?.previousReaction;
      const reportedReaction = reaction?.answer === 'yes' ? reaction.details : null;
      return { ...client, smsStoppedAt: client.smsStoppedAt?.toISOString() ?? null, reportedReaction, bookings };
    },
  );
  apiRoute(
    table,
    { method: 'patch', path: '/api/clients/:id', access: DESK, summary: "Edit a client card: contact details and message preferences", params: IdParamsSchema, body: UpdateClientSchema, response: ClientSummarySchema },
    async ({ user, params, body: typed }) => {
      const body = { ...typed, phone: storedPhone(typed.phone, await salonCountry(db, user.salonId)) };
      // Queued messages follow the new details in the same transaction: nothing goes to an old number.
      const found = await db.transaction().execute(async (trx) => {
        if (!(await updateClientContact(trx, user.salonId, params.id, body))) return false;
        await replanClientMessages(trx, params.id, new Date());
        return true;
      });
      if (!found) throw notFound('That client');
      return { id: params.id, name: body.name, email: body.email, phone: body.phone };
    },
  );
}
