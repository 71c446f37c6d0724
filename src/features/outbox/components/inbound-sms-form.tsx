import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { SimulateInboundSmsSchema } from '@shared/schemas/inbound-sms.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextField } from '@client/components/ui/text-field';
import { showServerErrors } from '@client/lib/form-errors';
import { useSimulateInboundSms } from '../api/inbound-sms-mutations';

type Input = z.input<typeof SimulateInboundSmsSchema>;
type Values = z.output<typeof SimulateInboundSmsSchema>;

/** Demo only: pretend a client texted the salon (STOP turns their texts off, START back on). */
export function InboundSmsForm() {
  const simulate = useSimulateInboundSms();
  const { register, handleSubmit, setError, formState } = useForm<Input, unknown, Values>({
    resolver: zodResolver(SimulateInboundSmsSchema),
    defaultValues: { from: '', body: 'STOP' },
  });
  const { errors } = formState;
  const submit = handleSubmit((body) => simulate.mutateAsync(body).catch((error) => showServerErrors(error, setError, ['from', 'body'])));
  return (
    <form onSubmit={(e) => void submit(e)} noValidate aria-label="Text the salon (demo)" className="flex flex-col gap-3">
      {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
      {simulate.data && <p role="status">Delivered to Dwell's SMS webhook (answer {simulate.data.webhookStatus}).</p>}
      <div className="grid gap-3 sm:grid-cols-[1fr_10rem]">
        <TextField label="From the client's mobile" type="tel" autoComplete="off" error={errors.from?.message} {...register('from')} />
        <TextField label="Text" autoComplete="off" hint="STOP or START" error={errors.body?.message} {...register('body')} />
      </div>
      <div>
        <Button type="submit" variant="secondary" busy={simulate.isPending}>
          Send text to the salon
        </Button>
      </div>
    </form>
  );
}
