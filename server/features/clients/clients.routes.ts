import { clientsApi } from '@shared/api/clients.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { addClient, clientCard, findClients, saveClientNotes, updateClient } from './clients.service';

export function registerClientRoutes({ table, db }: AppDeps): void {
  apiRoute(table, clientsApi.list, ({ user, query }) => findClients(db, user, query.q));
  apiRoute(table, clientsApi.create, ({ user, body }) => addClient(db, user, body));
  apiRoute(table, clientsApi.one, ({ user, params }) => clientCard(db, user, params.id));
  apiRoute(table, clientsApi.update, ({ user, params, body }) => updateClient(db, user, params.id, body, new Date()));
  apiRoute(table, clientsApi.notes, ({ user, params, body }) => saveClientNotes(db, user, params.id, body.notes));
}
