import { ClientAgeSchema, DateOfBirthBodySchema, RecordGuardianConsentSchema } from '../schemas/age.schemas';
import { CreateClientSchema } from '../schemas/booking.schemas';
import { ClientDetailSchema, ClientListQuerySchema, ClientListSchema, ClientNotesSchema, ClientSummarySchema } from '../schemas/client.schemas';
import { IdParamsSchema } from '../schemas/common.schemas';
import { UpdateClientSchema } from '../schemas/contact.schemas';
import { DESK, STAFF, endpoint } from './endpoint';

/** The salon's clients: search, add, the client card and its edit, and each client's age record. */
export const clientsApi = {
  list: endpoint({
    method: 'get',
    path: '/api/clients',
    access: STAFF,
    summary: 'Find clients by name, e-mail or phone',
    query: ClientListQuerySchema,
    response: ClientListSchema,
  }),
  create: endpoint({
    method: 'post',
    path: '/api/clients',
    access: DESK,
    summary: 'Add a client (e.g. at the desk while booking)',
    body: CreateClientSchema,
    response: ClientSummarySchema,
    status: 201,
  }),
  one: endpoint({
    method: 'get',
    path: '/api/clients/:id',
    access: STAFF,
    summary: 'A client card with their bookings',
    params: IdParamsSchema,
    response: ClientDetailSchema,
  }),
  update: endpoint({
    method: 'patch',
    path: '/api/clients/:id',
    access: DESK,
    summary: 'Edit a client card: contact details and message preferences',
    params: IdParamsSchema,
    body: UpdateClientSchema,
    response: ClientSummarySchema,
  }),
  notes: endpoint({
    method: 'put',
    path: '/api/clients/:id/notes',
    access: STAFF,
    summary: "Replace the team's notes on a client (audited)",
    params: IdParamsSchema,
    body: ClientNotesSchema,
    response: ClientNotesSchema,
  }),
  // Date of birth and guardian consent: oxidative colour for a client under 16 needs a guardian's consent on record.
  age: endpoint({
    method: 'get',
    path: '/api/clients/:id/age',
    access: STAFF,
    summary: "A client's date of birth and guardian consents",
    params: IdParamsSchema,
    response: ClientAgeSchema,
  }),
  setDateOfBirth: endpoint({
    method: 'put',
    path: '/api/clients/:id/date-of-birth',
    access: DESK,
    summary: "Set or remove a client's date of birth (audited)",
    params: IdParamsSchema,
    body: DateOfBirthBodySchema,
    response: ClientAgeSchema,
  }),
  myAge: endpoint({
    method: 'get',
    path: '/api/me/age',
    access: ['client'],
    summary: 'My date of birth and any guardian consent on record',
    response: ClientAgeSchema,
  }),
  setMyDateOfBirth: endpoint({
    method: 'put',
    path: '/api/me/date-of-birth',
    access: ['client'],
    summary: 'Set or remove my date of birth',
    body: DateOfBirthBodySchema,
    response: ClientAgeSchema,
  }),
  addGuardianConsent: endpoint({
    method: 'post',
    path: '/api/clients/:id/guardian-consents',
    access: DESK,
    summary: "Record a guardian's consent to oxidative colour for a client under 16 (kept and audited)",
    params: IdParamsSchema,
    body: RecordGuardianConsentSchema,
    response: ClientAgeSchema,
    status: 201,
  }),
};
