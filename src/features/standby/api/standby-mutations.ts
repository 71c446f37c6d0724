import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { StandbyEntrySchema, type CreateStandby } from '../../../../shared/schemas/standby.schemas';
import { apiWrite } from '../../../lib/api-client';
import { windowQueries } from '../../windows/api/window-queries';
import { standbyQueries } from './standby-queries';

// Windows list the standby clients who want them, so they change with the list.
function useStandbyChanged() {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: standbyQueries.list().queryKey }),
      queryClient.invalidateQueries({ queryKey: windowQueries.all() }),
    ]);
}

export function useAddStandby() {
  const changed = useStandbyChanged();
  return useMutation({
    mutationFn: (body: CreateStandby) => apiWrite('POST', apiPaths.standby, body, StandbyEntrySchema),
    onSuccess: changed,
  });
}

export function useRemoveStandby() {
  const changed = useStandbyChanged();
  return useMutation({
    mutationFn: (id: string) => apiWrite('DELETE', apiPaths.standbyEntry(id)),
    onSuccess: changed,
  });
}
