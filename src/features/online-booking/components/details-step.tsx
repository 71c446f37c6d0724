import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { SectionCard } from '../../../components/ui/section-card';
import { HairHistoryForm } from '../../hair-history/components/hair-history-form';
import { PhotoUploader } from '../../photos/components/photo-uploader';
import { StepHeading } from './step-heading';

type Props = { holdId: string; focusOnMount: boolean; onDone: () => void };

/**
 * Step 3: hair history and photos. Optional (the hold is ticking, and the salon can
 * ask at the consultation), but shown to everyone because the stylist plans from it.
 */
export function DetailsStep({ holdId, focusOnMount, onDone }: Props) {
  const [saved, setSaved] = useState(false);
  return (
    <section className="flex flex-col gap-4">
      <StepHeading focusOnMount={focusOnMount}>Your details</StepHeading>
      <p>
        Your hair history and photos help your stylist plan safely. Only you and this salon&apos;s team can see them. You can
        skip them now and bring the details to your appointment.
      </p>
      <SectionCard title="Hair history">
        {saved && <FormAlert tone="success">Hair history saved.</FormAlert>}
        <HairHistoryForm onSaved={() => setSaved(true)} />
      </SectionCard>
      <SectionCard title="Photos">
        <div className="flex flex-col gap-6">
          <PhotoUploader kind="hair_now" bookingId={holdId} />
          <PhotoUploader kind="wanted" bookingId={holdId} />
        </div>
      </SectionCard>
      <Button onClick={onDone} className="w-full sm:w-auto sm:self-start">
        Continue
      </Button>
    </section>
  );
}
