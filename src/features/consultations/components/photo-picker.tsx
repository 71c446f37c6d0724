import { useQuery } from '@tanstack/react-query';
import { useController, type Control } from 'react-hook-form';
import { FormAlert } from '@client/components/ui/form-alert';
import { LoadingState } from '@client/components/ui/loading-state';
import { photoQueries } from '@client/features/photos';
import { kindLabelsForStaff } from '@client/features/photos';
import { PhotoUploader } from '@client/features/photos';
import type { ConsultationFormInput, ConsultationFormValues } from '../consultation-form-schema';

type Props = { clientId: string; control: Control<ConsultationFormInput, unknown, ConsultationFormValues> };

/** Tick the client's photos that belong to this consultation; new ones added below join the list. */
export function PhotoPicker({ clientId, control }: Props) {
  const photos = useQuery(photoQueries.list({ clientId }));
  const { field } = useController({ control, name: 'photoIds' });
  const chosen = new Set(field.value);
  const toggle = (id: string) => field.onChange(chosen.has(id) ? field.value.filter((p) => p !== id) : [...field.value, id]);
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-1 font-bold">Photos for this consultation</legend>
      {photos.isPending && <LoadingState label="Loading photos…" />}
      {photos.isError && <FormAlert>{photos.error.message}</FormAlert>}
      {photos.data && photos.data.photos.length === 0 && <p className="text-ink/80">The client has no photos yet; add some below.</p>}
      <ul className="grid grid-cols-2 gap-3 sm:grid-cols-5">
        {photos.data?.photos.map((photo, i) => (
          <li key={photo.id}>
            <label className="flex cursor-pointer flex-col gap-1 rounded-lg p-1 ring-1 ring-ink/15 has-[:checked]:ring-4 has-[:checked]:ring-oxide">
              <img src={photo.url} alt="" width={photo.width} height={photo.height} loading="lazy" className="aspect-square w-full rounded object-cover" />
              <span className="flex items-center gap-2 text-sm">
                <input type="checkbox" checked={chosen.has(photo.id)} onChange={() => toggle(photo.id)} />
                {kindLabelsForStaff[photo.kind]}, photo {i + 1}
              </span>
            </label>
          </li>
        ))}
      </ul>
      <details className="rounded-lg bg-linen p-3">
        <summary className="cursor-pointer font-bold">Add new photos</summary>
        <div className="mt-3 flex flex-col gap-4">
          <PhotoUploader kind="hair_now" owner={{ clientId }} label={kindLabelsForStaff.hair_now} />
          <PhotoUploader kind="wanted" owner={{ clientId }} label={kindLabelsForStaff.wanted} />
        </div>
      </details>
    </fieldset>
  );
}
