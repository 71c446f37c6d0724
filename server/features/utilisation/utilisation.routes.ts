import { apiPaths } from '../../../shared/api/api-paths';
import { ScenarioSchema } from '../../../shared/engine/engine';
import { DeskUtilisationSchema, OwnerUtilisationSchema, UtilisationQuerySchema } from '../../../shared/schemas/utilisation.schemas';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { findSalon } from '../salon/salon.repository';
import { periodScenario } from './utilisation-occupancy';
import { deskSubset, ownerUtilisation, periodFor } from './utilisation.service';

export function registerUtilisationRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: apiPaths.ownerUtilisation, access: ['owner'], summary: 'Chair occupancy, hands-on share, window use, money and attendance for a period', query: UtilisationQuerySchema, response: OwnerUtilisationSchema },
    async ({ user, query }) => {
      const salon = await findSalon(db, user.salonId);
      return ownerUtilisation(db, salon, periodFor(salon, query, new Date()));
    },
  );
  apiRoute(
    table,
    { method: 'get', path: apiPaths.ownerUtilisationScenario, access: ['owner'], summary: 'The engine scenario behind the period’s occupancy figures (for `npm run plan -- occupancy`)', query: UtilisationQuerySchema, response: ScenarioSchema },
    async ({ user, query, res }) => {
      const salon = await findSalon(db, user.salonId);
      const period = periodFor(salon, query, new Date());
      const scenario = await periodScenario(db, salon.id, period);
      res.setHeader('Content-Disposition', `attachment; filename="dwell-scenario-${period.from}-to-${period.to}.json"`);
      return scenario;
    },
  );
  apiRoute(
    table,
    { method: 'get', path: apiPaths.deskUtilisation, access: ['front_desk', 'owner'], summary: 'Chair occupancy, window use and attendance for a period (no money, no per-stylist figures)', query: UtilisationQuerySchema, response: DeskUtilisationSchema },
    async ({ user, query }) => {
      const salon = await findSalon(db, user.salonId);
      return deskSubset(await ownerUtilisation(db, salon, periodFor(salon, query, new Date())));
    },
  );
}
