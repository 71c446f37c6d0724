import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import type { z } from 'zod';
import type { ClientSummary } from '@shared/schemas/client.schemas';
import type { ServiceSummary } from '@shared/schemas/service.schemas';
import { CreateStandbySchema, type CreateStandby } from '@shared/schemas/standby.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { showServerErrors } from '@client/lib/form-errors';
import { ClientPicker } from '@client/features/clients';
import { useAddStandby } from '../api/standby-mutations';
import { AvailabilityRows } from './availability-rows';
import { ServiceChecklist } from './service-checklist';

type Props = { services: ServiceSummary[]; stylists: { id: string; name: string }[] };
type FormValues = Omit<CreateStandby, 'stylistId'> & { stylistId: string };

const empty: FormValues = { clientId: '', serviceIds: [], stylistId: '', availability: [{ weekdays: [], from: '09:00', to: '17:00' }], notes: '' };

/** Put a client on the standby list: what they want, with whom, and when they can come at short notice. */
export function StandbyForm({ services, stylists }: Props) {
  const add = useAddStandby();
  const [client, setClient] = useState<ClientSummary | null>(null);
  const [added, setAdded] = useState<string | null>(null);
  const form = useForm<FormValues, unknown, z.output<typeof CreateStandbySchema>>({
    resolver: (values, context, options) =>
      zodResolver(CreateStandbySchema)({ ...values, stylistId: values.stylistId || null }, context, options as never) as never,
    defaultValues: empty,
  });
  const { errors } = form.formState;
  const submit = form.handleSubmit((body) =>
    add.mutateAsync(body).then(
      (entry) => {
        setAdded(`${entry.client.name} is on the standby list.`);
        setClient(null);
        form.reset(empty);
      },
      (error) => showServerErrors(error, form.setError, ['clientId', 'serviceIds', 'notes']),
    ),
  );
  return (
    <FormProvider {...form}>
      <form aria-label="Add to the standby list" noValidate onSubmit={submit} className="flex flex-col gap-5">
        {added && <FormAlert tone="success">{added}</FormAlert>}
        {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
        <ClientPicker
          value={client}
          onChange={(next) => {
            setClient(next);
            form.setValue('clientId', next?.id ?? '', { shouldValidate: form.formState.isSubmitted });
          }}
          error={errors.clientId && 'Pick a client or add a new one'}
        />
        <ServiceChecklist services={services} />
        <SelectField
          label="Stylist"
          options={[{ value: '', label: 'Any stylist' }, ...stylists.map((s) => ({ value: s.id, label: s.name }))]}
          {...form.register('stylistId')}
        />
        <AvailabilityRows />
        <TextField label="Notes" hint="Anything the desk should know when calling" error={errors.notes?.message} {...form.register('notes')} />
        <div>
          <Button type="submit" busy={add.isPending}>
            Add to standby list
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
