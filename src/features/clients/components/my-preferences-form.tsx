import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { MyPreferencesBodySchema, type MyPreferences } from '@shared/schemas/contact.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextField } from '@client/components/ui/text-field';
import { showServerErrors } from '@client/lib/form-errors';
import { useSaveMyPreferences } from '../api/preference-queries';
import { MessagePreferenceFields } from './message-preference-fields';

type Input = z.input<typeof MyPreferencesBodySchema>;
type Values = z.output<typeof MyPreferencesBodySchema>;

/** A client chooses how the salon reaches them. */
export function MyPreferencesForm({ current }: { current: MyPreferences }) {
  const save = useSaveMyPreferences();
  const { register, handleSubmit, setError, reset, formState } = useForm<Input, unknown, Values>({
    resolver: zodResolver(MyPreferencesBodySchema),
    defaultValues: { phone: current.phone ?? '', messageChannel: current.messageChannel, marketingOptIn: current.marketingOptIn },
  });
  const { errors } = formState;
  const submit = handleSubmit((body) =>
    save.mutateAsync(body).then(
      (saved) => reset({ phone: saved.phone ?? '', messageChannel: saved.messageChannel, marketingOptIn: saved.marketingOptIn }),
      (error) => showServerErrors(error, setError, ['phone', 'messageChannel']),
    ),
  );
  return (
    <form onSubmit={(e) => void submit(e)} noValidate aria-label="Messages from the salon" className="flex flex-col gap-3">
      {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
      {save.isSuccess && !formState.isDirty && <p role="status">Saved.</p>}
      <TextField label="Mobile" type="tel" autoComplete="tel" error={errors.phone?.message} {...register('phone')} />
      <p className="text-sm">E-mails go to {current.email ?? 'your sign-in address'}.</p>
      <MessagePreferenceFields register={register} smsStoppedAt={current.smsStoppedAt} you />
      <div>
        <Button type="submit" variant="secondary" busy={save.isPending}>
          Save message settings
        </Button>
      </div>
    </form>
  );
}
