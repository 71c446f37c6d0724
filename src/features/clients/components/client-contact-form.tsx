import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { UpdateClientSchema } from '@shared/schemas/contact.schemas';
import type { ClientDetail } from '@shared/schemas/client.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextField } from '@client/components/ui/text-field';
import { showServerErrors } from '@client/lib/form-errors';
import { useUpdateClient } from '../api/client-mutations';
import { MessagePreferenceFields } from './message-preference-fields';
import { usePhoneText } from '../../salon';

type Input = z.input<typeof UpdateClientSchema>;
type Values = z.output<typeof UpdateClientSchema>;

/** The desk edits how to reach a client and how they want to hear from the salon. */
export function ClientContactForm({ client }: { client: ClientDetail }) {
  const update = useUpdateClient(client.id);
  const phoneText = usePhoneText();
  const initial: Input = {
    name: client.name,
    email: client.email ?? '',
    phone: client.phone ? phoneText(client.phone) : '',
    messageChannel: client.messageChannel,
    marketingOptIn: client.marketingOptIn,
  };
  const { register, handleSubmit, setError, reset, formState } = useForm<Input, unknown, Values>({
    resolver: zodResolver(UpdateClientSchema),
    defaultValues: initial,
  });
  const { errors } = formState;
  const save = handleSubmit((body) =>
    update.mutateAsync(body).then(
      (saved) => reset({ ...body, email: saved.email ?? '', phone: saved.phone ? phoneText(saved.phone) : '' }),
      (error) => showServerErrors(error, setError, ['name', 'email', 'phone', 'messageChannel']),
    ),
  );
  return (
    <form onSubmit={(e) => void save(e)} noValidate aria-label="Contact and messages" className="flex flex-col gap-4">
      {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
      {update.isSuccess && !formState.isDirty && <p role="status">Saved.</p>}
      <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          label="Mobile"
          type="tel"
          autoComplete="off"
          hint="Any format, e.g. (970) 555-0142, or with its country code"
          error={errors.phone?.message}
          {...register('phone')}
        />
        <TextField label="E-mail" type="email" autoComplete="off" error={errors.email?.message} {...register('email')} />
      </div>
      <MessagePreferenceFields register={register} smsStoppedAt={client.smsStoppedAt} you={false} />
      <div>
        <Button type="submit" busy={update.isPending}>
          Save contact details
        </Button>
      </div>
    </form>
  );
}
