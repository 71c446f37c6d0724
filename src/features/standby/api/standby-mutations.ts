import { useMutation, useQueryClient } from '@tanstack/react-query';
import { standbyApi } from '@shared/api/standby.api';
import type { CreateStandby } from '@shared/schemas/standby.schemas';
import { callApi } from '@client/lib/api-client';
import { standbyChanged } from '@client/lib/cache-rules';

export function useAddStandby() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateStandby) => callApi(standbyApi.add, { body }),
    onSuccess: () => standbyChanged(queryClient),
  });
}

export function useRemoveStandby() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => callApi(standbyApi.remove, { params: { id } }),
    onSuccess: () => standbyChanged(queryClient),
  });
}
