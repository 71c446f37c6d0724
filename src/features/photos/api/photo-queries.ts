import { photosApi } from '../../../../shared/api/photos.api';
import { apiQuery } from '../../../lib/api-client';
import type { RecordOwner } from '../../../lib/record-owner';

export type PhotoOwner = RecordOwner;

export const photoQueries = {
  list: (owner: RecordOwner) => (owner === 'me' ? apiQuery(photosApi.mine) : apiQuery(photosApi.ofClient, { params: { id: owner.clientId } })),
};
