import { useMutation, useQueryClient } from '@tanstack/react-query';
import { photoPaths } from '../../../../shared/api/hair-paths';
import { PhotoListSchema, type PhotoKind } from '../../../../shared/schemas/photo.schemas';
import { apiWrite } from '../../../lib/api-client';
import { uploadForm } from '../../../lib/upload-file';
import { photoListPath, photoQueries, type PhotoOwner } from './photo-queries';

export type UploadInput = { files: File[]; kind: PhotoKind; bookingId?: string };

/** Uploads a batch; `onProgress` gets 0…1 while bytes go out. Every cached photo list is refreshed after. */
export function useUploadPhotos(owner: PhotoOwner, onProgress: (fraction: number) => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ files, kind, bookingId }: UploadInput) => {
      const form = new FormData();
      form.append('kind', kind);
      if (bookingId) form.append('bookingId', bookingId);
      for (const file of files) form.append('photos', file, file.name);
      return uploadForm(photoListPath(owner), form, PhotoListSchema, onProgress);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: photoQueries.all() }),
  });
}

export function useRemovePhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiWrite('DELETE', photoPaths.one(id)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: photoQueries.all() }),
  });
}
