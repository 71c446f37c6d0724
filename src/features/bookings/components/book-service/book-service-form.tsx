import { useFormContext } from 'react-hook-form';
import type { ClientSummary } from '@shared/schemas/client.schemas';
import type { ServiceSummary } from '@shared/schemas/service.schemas';
import { Button } from '@client/components/ui/button';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { ClientPicker } from '@client/features/clients';
import type { BookFormInput } from '@client/features/bookings/book-form-schema';
import { StepPlanEditor } from '../step-plan/step-plan-editor';

type Props = {
  services: ServiceSummary[];
  stylists: { id: string; name: string; skills: string[] }[];
  client: ClientSummary | null;
  onClient: (client: ClientSummary | null) => void;
  onService: (service: ServiceSummary | null) => void;
  onFind: () => void;
  finding: boolean;
  primary: boolean;
};

/** Who, what (with its step plan), with whom, from when: everything the engine needs to look for times. */
export function BookServiceForm({ services, stylists, client, onClient, onService, onFind, finding, primary }: Props) {
  const { register, watch, formState } = useFormContext<BookFormInput>();
  const { errors } = formState;
  const service = services.find((s) => s.id === watch('serviceId')) ?? null;
  const skilled = service ? stylists.filter((s) => s.skills.includes(service.skill)) : stylists;
  return (
    <form
      aria-label="What to book"
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        onFind();
      }}
      className="flex flex-col gap-5 rounded-2xl bg-white p-5 shadow-sm ring-1 ring-ink/10"
    >
      <ClientPicker value={client} onChange={onClient} error={errors.clientId?.message} />
      <SelectField
        label="Service"
        error={errors.serviceId?.message}
        options={[{ value: '', label: 'Choose a service…' }, ...services.map((s) => ({ value: s.id, label: s.name }))]}
        {...register('serviceId', { onChange: (event) => onService(services.find((s) => s.id === event.target.value) ?? null) })}
      />
      {service && <StepPlanEditor key={service.id} />}
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField
          label="Stylist"
          options={[{ value: '', label: 'Any with the skill' }, ...skilled.map((s) => ({ value: s.id, label: s.name }))]}
          {...register('stylistId')}
        />
        <TextField label="Earliest date" type="date" error={errors.earliestDate?.message} {...register('earliestDate')} />
      </div>
      {errors.stepPlan && <p className="text-sm font-bold text-brick">Check the step plan: some steps need changes.</p>}
      <div>
        <Button type="submit" variant={primary ? 'primary' : 'secondary'} busy={finding}>
          Find times
        </Button>
      </div>
    </form>
  );
}
