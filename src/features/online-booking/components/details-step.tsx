import { SectionCard } from '@client/components/ui/section-card';
import { HairHistoryForm } from '@client/features/hair-history';
import { PhotoUploader } from '@client/features/photos';
import { StepHeading } from './step-heading';

type Props = { holdId: string; focusOnMount: boolean; onDone: () => void };

/**
 * Step 3: photos and hair history. Shown to everyone because the stylist plans from them. The client's photos
 * from before are listed (the salon sees them already); new ones are kept as they upload, linked to this booking.
 * The hair history is saved by the step's one action, so answers typed here are never lost by moving on.
 */
export function DetailsStep({ holdId, focusOnMount, onDone }: Props) {
  return (
    <section className="flex flex-col gap-4">
      <StepHeading focusOnMount={focusOnMount}>Your details</StepHeading>
      <p>
        Your photos and hair history help your stylist plan safely. Only you and this salon&apos;s team can see them. Photos you added before are shown here and
        count for this booking too. Anything you leave out now can be brought to your appointment.
      </p>
      <SectionCard title="Photos">
        <div className="flex flex-col gap-6">
          <PhotoUploader kind="hair_now" bookingId={holdId} listed="all" />
          <PhotoUploader kind="wanted" bookingId={holdId} listed="all" />
        </div>
      </SectionCard>
      <SectionCard title="Hair history">
        <HairHistoryForm onSaved={onDone} submitLabel="Save and continue" />
      </SectionCard>
    </section>
  );
}
