import { photosApi } from '@shared/api/photos.api';
import { apiQuery } from '@client/lib/api-client';
import type { RecordOwner } from '@client/lib/record-owner';

export type PhotoOwner = RecordOwner;

export const photoQueries = {
  list: (owner: RecordOwner) => (owner === 'me' ? apiQuery(photosApi.mine) : apiQuery(photosApi.ofClient, { params: { id: owner.clientId } })),
};
