import { catalogueApi } from '@shared/api/catalogue.api';
import { apiQuery } from '@client/lib/api-client';

// The salon's menu and its stylists change rarely and are read on most desk pages.
const FIVE_MINUTES = 5 * 60_000;

export const catalogueQueries = {
  services: () => ({ ...apiQuery(catalogueApi.services), staleTime: FIVE_MINUTES }),
  stylists: () => ({ ...apiQuery(catalogueApi.stylists), staleTime: FIVE_MINUTES }),
};
