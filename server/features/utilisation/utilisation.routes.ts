import { utilisationApi } from '@shared/api/utilisation.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { deskUtilisationFor, ownerUtilisationFor, utilisationScenarioFor } from './utilisation.service';

export function registerUtilisationRoutes({ table, db }: AppDeps): void {
  apiRoute(table, utilisationApi.owner, async ({ user, query }) => ownerUtilisationFor(db, user.salonId, query, new Date()));
  apiRoute(table, utilisationApi.scenario, async ({ user, query, res }) => {
    const { period, scenario } = await utilisationScenarioFor(db, user.salonId, query, new Date());
    res.setHeader('Content-Disposition', `attachment; filename="dwell-scenario-${period.from}-to-${period.to}.json"`);
    return scenario;
  });
  apiRoute(table, utilisationApi.desk, async ({ user, query }) => deskUtilisationFor(db, user.salonId, query, new Date()));
}
