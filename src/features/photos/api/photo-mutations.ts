import { useMutation, useQueryClient } from '@tanstack/react-query';
import { urlOf } from '@shared/api/endpoint';
import { photosApi } from '@shared/api/photos.api';
import type { PhotoKind } from '@shared/schemas/photo.schemas';
import { callApi } from '@client/lib/api-client';
import { photosChanged } from '@client/lib/cache-rules';
import { uploadForm } from '@client/lib/upload-file';
import type { PhotoOwner } from './photo-queries';

export type UploadInput = { files: File[]; kind: PhotoKind; bookingId?: string };

/** Uploads a batch; `onProgress` gets 0…1 while bytes go out. Every cached photo list is refreshed after. */
export function useUploadPhotos(owner: PhotoOwner, onProgress: (fraction: number) => void) {
  const queryClient = useQueryClient();
  const endpoint = owner === 'me' ? photosApi.addMine : photosApi.addToClient;
  return useMutation({
    mutationFn: ({ files, kind, bookingId }: UploadInput) => {
      const form = new FormData();
      form.append('kind', kind);
      if (bookingId) form.append('bookingId', bookingId);
      for (const file of files) form.append(endpoint.upload.fileField, file, file.name);
      const url = urlOf(endpoint, owner === 'me' ? {} : { params: { id: owner.clientId } });
      return uploadForm(url, form, endpoint.response, onProgress);
    },
    onSettled: () => photosChanged(queryClient),
  });
}

export function useRemovePhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => callApi(photosApi.remove, { params: { id } }),
    onSuccess: () => photosChanged(queryClient),
  });
}
