import { queryOptions } from '@tanstack/react-query';
import { photoPaths } from '../../../../shared/api/hair-paths';
import { PhotoListSchema } from '../../../../shared/schemas/photo.schemas';
import { apiGet } from '../../../lib/api-client';
import { ownerKey, ownerPath, type RecordOwner } from '../../../lib/record-owner';

export type PhotoOwner = RecordOwner;
export const photoListPath = (owner: RecordOwner) => ownerPath(owner, photoPaths);

export const photoQueries = {
  all: () => ['photos'] as const,
  list: (owner: RecordOwner) =>
    queryOptions({ queryKey: [...photoQueries.all(), ownerKey(owner)] as const, queryFn: () => apiGet(photoListPath(owner), PhotoListSchema) }),
};
