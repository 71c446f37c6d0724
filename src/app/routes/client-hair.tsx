import { PageHeader } from '@client/components/ui/page-header';
import { HairHistoryForm } from '@client/features/hair-history/components/hair-history-form';
import { PhotoUploader } from '@client/features/photos/components/photo-uploader';
import { SectionCard } from '@client/components/ui/section-card';

/** The client's own hair history and photos, outside any booking. */
export function Component() {
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Hair history and photos" subtitle="Only you and your salon’s team can see these." />
      <SectionCard title="Hair history">
        <HairHistoryForm />
      </SectionCard>
      <SectionCard title="Photos">
        <div className="flex flex-col gap-6">
          <PhotoUploader kind="hair_now" />
          <PhotoUploader kind="wanted" />
        </div>
      </SectionCard>
    </div>
  );
}
