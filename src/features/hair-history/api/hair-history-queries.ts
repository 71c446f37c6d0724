import { hairHistoryApi } from '@shared/api/hair-history.api';
import { apiQuery } from '@client/lib/api-client';
import type { RecordOwner } from '@client/lib/record-owner';

export const hairHistoryQueries = {
  detail: (owner: RecordOwner) => (owner === 'me' ? apiQuery(hairHistoryApi.mine) : apiQuery(hairHistoryApi.ofClient, { params: { id: owner.clientId } })),
};
