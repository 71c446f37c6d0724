import { ScenarioSchema } from '../engine/scenario.schemas';
import { DeskUtilisationSchema, OwnerUtilisationSchema, UtilisationQuerySchema } from '../schemas/utilisation.schemas';
import { DESK, endpoint } from './endpoint';

/** How the salon's chairs, stylists and windows were used over a period. */
export const utilisationApi = {
  owner: endpoint({
    method: 'get',
    path: '/api/owner/utilisation',
    access: ['owner'],
    summary: 'Chair occupancy, hands-on share, window use, money and attendance for a period',
    query: UtilisationQuerySchema,
    response: OwnerUtilisationSchema,
  }),
  // JSON, downloaded as a file (Content-Disposition) for `npm run plan -- occupancy`.
  scenario: endpoint({
    method: 'get',
    path: '/api/owner/utilisation/scenario',
    access: ['owner'],
    summary: 'The engine scenario behind the period’s occupancy figures (for `npm run plan -- occupancy`)',
    query: UtilisationQuerySchema,
    response: ScenarioSchema,
  }),
  desk: endpoint({
    method: 'get',
    path: '/api/desk/utilisation',
    access: DESK,
    summary: 'Chair occupancy, window use and attendance for a period (no money, no per-stylist figures)',
    query: UtilisationQuerySchema,
    response: DeskUtilisationSchema,
  }),
};
