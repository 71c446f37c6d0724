import { useQuery } from '@tanstack/react-query';
import { useId, useState, type ChangeEvent } from 'react';
import { PHOTO_LIMITS, type PhotoKind } from '@shared/schemas/photo.schemas';
import { FormAlert } from '@client/components/ui/form-alert';
import { isApiError } from '@client/lib/api-error';
import { useUploadPhotos } from '../api/photo-mutations';
import { photoQueries, type PhotoOwner } from '../api/photo-queries';
import { kindLabels } from './photo-labels';
import { PhotoThumbnails } from './photo-thumbnails';

/**
 * `bookingId` links new photos to a booking. `listed`: which photos show — only that booking's (a visit's photos in
 * the mix log), or all of this kind (the online flow, where the client's earlier photos count too).
 */
type Props = { kind: PhotoKind; bookingId?: string; owner?: PhotoOwner; label?: string; listed?: 'booking' | 'all' };

// HEIC is left out on purpose: iPhones then convert HEIC photos to JPEG as they are picked, and the
// prebuilt image library on the server cannot decode HEIC (see docs/operations.md, Uploads).
const ACCEPT = 'image/jpeg,image/png,image/webp';
const MB = PHOTO_LIMITS.bytesPerFile / 1024 / 1024;

/** Picks several photos of one kind and uploads them at once with a progress bar; shows what is kept. */
export function PhotoUploader({ kind, bookingId, owner = 'me', label = kindLabels[kind], listed = 'booking' }: Props) {
  const inputId = useId();
  const [progress, setProgress] = useState(0);
  const upload = useUploadPhotos(owner, setProgress);
  const list = useQuery(photoQueries.list(owner));
  const photos = (list.data?.photos ?? []).filter((p) => p.kind === kind && (!bookingId || listed === 'all' || p.bookingId === bookingId));

  const onPick = (event: ChangeEvent<HTMLInputElement>) => {
    const files = [...(event.target.files ?? [])];
    event.target.value = ''; // the same file can be picked again after an error
    if (files.length === 0) return;
    setProgress(0);
    upload.mutate({ files, kind, bookingId });
  };
  const problems = isApiError(upload.error) ? Object.values(upload.error.fields) : [];

  return (
    <section aria-labelledby={`${inputId}-title`} className="flex flex-col gap-3">
      <h3 id={`${inputId}-title`} className="text-lg font-bold">
        {label}
      </h3>
      <div className="flex flex-col gap-1">
        <label htmlFor={inputId} className="font-bold">
          Add photos
        </label>
        <p id={`${inputId}-hint`} className="text-sm text-ink/80">
          JPEG, PNG or WebP, up to {MB} MB each and {PHOTO_LIMITS.filesPerRequest} at a time. Location and camera details are removed.
        </p>
        <input
          id={inputId}
          type="file"
          multiple
          accept={ACCEPT}
          disabled={upload.isPending}
          aria-describedby={`${inputId}-hint`}
          onChange={onPick}
          className="min-h-11 rounded-lg border border-edge bg-white p-2 text-base file:mr-3 file:rounded-md file:border-0 file:bg-linen file:px-3 file:py-2 file:font-bold"
        />
      </div>
      {upload.isPending && (
        <div className="flex flex-col gap-1">
          <progress max={1} value={progress} aria-label={`Uploading ${label.toLowerCase()}`} className="h-3 w-full accent-oxide" />
          <p role="status" className="text-sm">
            {progress < 1 ? `Uploading… ${Math.round(progress * 100)}%` : 'Checking the photos…'}
          </p>
        </div>
      )}
      {upload.isError && (
        <FormAlert>
          {upload.error.message}
          {problems.length > 1 && (
            <ul className="mt-1 list-disc pl-5 font-normal">
              {problems.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          )}
        </FormAlert>
      )}
      {upload.isSuccess && (
        <FormAlert tone="success">{upload.data.photos.length === 1 ? 'Photo added.' : `${upload.data.photos.length} photos added.`}</FormAlert>
      )}
      {list.isError ? <FormAlert>{list.error.message}</FormAlert> : <PhotoThumbnails photos={photos} label={label} />}
    </section>
  );
}
