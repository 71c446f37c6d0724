import { messagesApi } from '@shared/api/messages.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { myPreferences, saveMyPreferences } from './preferences.service';

/** A client reads and sets how the salon reaches them. */
export function registerPreferenceRoutes({ table, db }: AppDeps): void {
  apiRoute(table, messagesApi.myPreferences, async ({ user }) => myPreferences(db, user));
  apiRoute(table, messagesApi.saveMyPreferences, async ({ user, body }) => saveMyPreferences(db, user, body, new Date()));
}
