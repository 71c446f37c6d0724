import type { Photo } from '@shared/schemas/photo.schemas';
import { ConfirmRemove } from '@client/components/ui/confirm-remove';
import { FormAlert } from '@client/components/ui/form-alert';
import { formatDate } from '@shared/format/date-time';
import { deviceFormat } from '@client/lib/time';
import { toastDone } from '@client/lib/toast';
import { useRemovePhoto } from '../api/photo-mutations';

type Props = { photos: Photo[]; label: string };

/** Thumbnails loaded through the authorised photo route, each with a remove button that asks first (a photo cannot come back). */
export function PhotoThumbnails({ photos, label }: Props) {
  const remove = useRemovePhoto();
  if (photos.length === 0) return <p className="text-ink/80">No photos yet.</p>;
  return (
    <div className="flex flex-col gap-2">
      {remove.isError && <FormAlert>{remove.error.message}</FormAlert>}
      <ul className="grid grid-cols-2 gap-3 sm:grid-cols-4" aria-label={label}>
        {photos.map((photo, i) => {
          const name = `${label}, photo ${i + 1} of ${photos.length}, added ${formatDate(photo.createdAt, deviceFormat(), { width: 'short' })}`;
          return (
            <li key={photo.id} className="flex flex-col gap-1">
              <a href={photo.url} target="_blank" rel="noreferrer" className="block overflow-hidden rounded-lg ring-1 ring-ink/10">
                <img src={photo.url} alt={name} width={photo.width} height={photo.height} loading="lazy" className="aspect-square w-full object-cover" />
              </a>
              <ConfirmRemove
                what={name}
                busy={remove.isPending && remove.variables === photo.id}
                onRemove={() => remove.mutate(photo.id, { onSuccess: () => toastDone('Photo removed.') })}
              />
            </li>
          );
        })}
      </ul>
    </div>
  );
}
