import { PhotoKindSchema } from '@shared/schemas/photo.schemas';
import { kindLabelsForStaff } from './photo-labels';
import { PhotoUploader } from './photo-uploader';

/** A client's photos for the salon's team, by kind; the team can add or remove photos too. */
export function PhotoGallery({ clientId }: { clientId: string }) {
  return (
    <div className="flex flex-col gap-6">
      {PhotoKindSchema.options.map((kind) => (
        <PhotoUploader key={kind} kind={kind} owner={{ clientId }} label={kindLabelsForStaff[kind]} />
      ))}
    </div>
  );
}
