import { zodResolver } from '@hookform/resolvers/zod';
import { FormProvider, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { ChangePlanSchema } from '@shared/schemas/booking.schemas';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { SectionCard } from '@client/components/ui/section-card';
import { showServerErrors } from '@client/lib/form-errors';
import { useChangePlan } from '@client/features/bookings/api/booking-mutations';
import { StepPlanEditor } from '../step-plan/step-plan-editor';

type Props = { booking: BookingView };

/**
 * Changes what this booking does, each sitting kept at its start. When the client's skin-test record blocks the
 * colour, this is the way out besides cancelling: steps that need no skin test (e.g. a direct dye).
 */
export function ChangePlanForm({ booking }: Props) {
  const change = useChangePlan(booking.id);
  const form = useForm<z.input<typeof ChangePlanSchema>>({ resolver: zodResolver(ChangePlanSchema), defaultValues: { stepPlan: booking.stepPlan } });
  const blocked = booking.skinTest.status === 'blocked';
  const submit = form.handleSubmit((body) => change.mutateAsync(body).catch((e) => showServerErrors(e, form.setError, ['stepPlan'])));
  return (
    <SectionCard title="Change the steps">
      <FormProvider {...form}>
        <form aria-label="Change the steps" noValidate onSubmit={(e) => void submit(e)} className="flex flex-col gap-3">
          {blocked && (
            <p className="text-sm">
              The client’s skin-test record blocks this colour. Change the steps to ones that need no skin test (for example a direct dye), or cancel: the
              deposit is then refunded in full.
            </p>
          )}
          {form.formState.errors.root?.server && <FormAlert>{form.formState.errors.root.server.message}</FormAlert>}
          {form.formState.errors.stepPlan?.message && <FormAlert>{form.formState.errors.stepPlan.message}</FormAlert>}
          <StepPlanEditor title="Steps of this booking" defaultOpen={blocked} />
          {change.isSuccess && !form.formState.isDirty && <FormAlert tone="success">The steps are changed; each sitting kept its start.</FormAlert>}
          <div>
            <Button type="submit" variant={blocked ? 'primary' : 'secondary'} busy={form.formState.isSubmitting}>
              Change the steps
            </Button>
          </div>
        </form>
      </FormProvider>
    </SectionCard>
  );
}
