import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { CreateClientSchema } from '@shared/schemas/booking.schemas';
import type { ClientSummary } from '@shared/schemas/client.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextField } from '@client/components/ui/text-field';
import { showServerErrors } from '@client/lib/form-errors';
import { useCreateClient, type CreateClientInput, type CreateClientValues } from '../api/client-mutations';

type Props = { initialName: string; onCreated: (client: ClientSummary) => void };

/**
 * Adds a client without leaving the page. It sits inside another form, so it is a
 * group with its own button rather than a nested <form>.
 */
export function ClientCreateForm({ initialName, onCreated }: Props) {
  const create = useCreateClient();
  const { register, handleSubmit, setError, formState } = useForm<CreateClientInput, unknown, CreateClientValues>({
    resolver: zodResolver(CreateClientSchema),
    defaultValues: { name: initialName, phone: '', email: '' },
  });
  const { errors } = formState;
  const save = handleSubmit((body) => create.mutateAsync(body).then(onCreated, (error) => showServerErrors(error, setError, ['name', 'phone', 'email'])));
  return (
    <div role="group" aria-label="New client" className="flex flex-col gap-3 rounded-lg bg-linen p-4">
      {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
      <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField label="Mobile" type="tel" autoComplete="off" hint="For reminders by SMS" error={errors.phone?.message} {...register('phone')} />
        <TextField label="E-mail" type="email" autoComplete="off" error={errors.email?.message} {...register('email')} />
      </div>
      <div>
        <Button variant="secondary" busy={create.isPending} onClick={() => void save()}>
          Add client
        </Button>
      </div>
    </div>
  );
}
