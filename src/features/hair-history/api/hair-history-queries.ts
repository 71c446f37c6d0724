import { queryOptions } from '@tanstack/react-query';
import { hairHistoryPaths } from '../../../../shared/api/hair-paths';
import { HairHistoryResponseSchema } from '../../../../shared/schemas/hair-history.schemas';
import { apiGet } from '../../../lib/api-client';
import { ownerKey, ownerPath, type RecordOwner } from '../../../lib/record-owner';

export type HistoryOwner = RecordOwner;
export const historyPath = (owner: RecordOwner) => ownerPath(owner, hairHistoryPaths);

export const hairHistoryQueries = {
  all: () => ['hair-history'] as const,
  detail: (owner: RecordOwner) =>
    queryOptions({ queryKey: [...hairHistoryQueries.all(), ownerKey(owner)] as const, queryFn: () => apiGet(historyPath(owner), HairHistoryResponseSchema) }),
};
