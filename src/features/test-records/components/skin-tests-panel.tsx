import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { RecordSkinTestSchema } from '../../../../shared/schemas/skin-test.schemas';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { Notice } from '../../../components/ui/notice';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { fieldError, showServerErrors } from '../../../lib/form-errors';
import { formatDate, formatTime } from '../../../../shared/format/date-time';
import { formatFor } from '../../../../shared/format/locale';
import { testRecordQueries, useRecordSkinTest } from '../api/test-record-queries';
import { InstantField } from './instant-field';
import { SkinTestReadingForm } from './skin-test-reading-form';
import { ClearancePanel } from './clearance-panel';
import { sessionQueries } from '../../auth/api/session-queries';
import { skinTestResultLabels } from './skin-test-result-labels';
import { nowInZone } from '../../../lib/time';

type Input = z.input<typeof RecordSkinTestSchema>;
const resultOptions = Object.entries(skinTestResultLabels).map(([value, label]) => ({ value, label }));

/** The client's skin tests with who recorded and read them, the reading of a pending one, and the form to record one. */
export function SkinTestsPanel({ clientId, zone }: { clientId: string; zone: string }) {
  const list = useQuery(testRecordQueries.skin(clientId));
  const record = useRecordSkinTest(clientId);
  const now = nowInZone(zone);
  const form = useForm<Input>({ resolver: zodResolver(RecordSkinTestSchema), defaultValues: { appliedAt: now, readAt: null, result: 'pending', product: '', notes: '' } });
  const { register, control, handleSubmit, setError, formState, reset } = form;
  const err = (path: string) => fieldError(formState.errors, path);
  const submit = handleSubmit((body) => record.mutateAsync(body).then(() => reset(), (e) => showServerErrors(e, setError, ['appliedAt', 'readAt', 'result', 'product', 'notes'])));
  const session = useQuery(sessionQueries.current());
  const tests = list.data?.tests ?? [];
  const clearances = list.data?.clearances ?? [];
  // A reaction at any time blocks oxidative colour until an owner's clearance recorded after it (the one rule).
  const reaction = tests.find((t) => t.result === 'positive');
  const cleared = reaction && clearances.some((c) => c.recordedAt >= (reaction.readAt ?? reaction.appliedAt));
  const latestRead = tests.find((t) => t.result !== 'pending');
  return (
    <div className="flex flex-col gap-4">
      {reaction && !cleared && (
        <Notice tone="danger" title="A skin test showed a reaction: no oxidative colour until an owner records a clearance.">
          Do not colour with oxidative products; follow local regulations and licensed practice. Upcoming colour bookings of this client are
          flagged below: cancel them (the deposit is refunded in full) or change the plan to steps that need no skin test.
        </Notice>
      )}
      {!reaction && latestRead?.result === 'unclear' && (
        <Notice tone="danger" title="The latest skin test was unclear: a new test is needed before oxidative colour.">
          Upcoming colour bookings of this client are flagged below until a new test reads negative.
        </Notice>
      )}
      {reaction && <ClearancePanel clientId={clientId} zone={zone} clearances={clearances} canClear={session.data?.role === 'owner'} />}
      {list.isError && <FormAlert>{list.error.message}</FormAlert>}
      {list.data && list.data.tests.length === 0 && <p className="text-ink/80">No skin test on record.</p>}
      <ul className="flex flex-col gap-2" aria-label="Skin tests">
        {list.data?.tests.map((t) => (
          <li key={t.id} className="rounded-lg bg-linen px-3 py-2">
            <span className="font-bold">{skinTestResultLabels[t.result]}</span> · applied {formatDate(t.appliedAt, formatFor(zone), { width: 'short' })} {formatTime(t.appliedAt, formatFor(zone))}
            {t.product && ` · ${t.product}`} · recorded by {t.recordedByName ?? 'the salon'}
            {t.readAt && ` · read ${formatDate(t.readAt, formatFor(zone), { width: 'short' })} ${formatTime(t.readAt, formatFor(zone))} by ${t.readByName ?? 'the salon'}`}
            {t.notes && <span className="block text-sm">{t.notes}</span>}
            {t.result === 'pending' && <SkinTestReadingForm clientId={clientId} test={t} zone={zone} />}
          </li>
        ))}
      </ul>
      <form onSubmit={(e) => void submit(e)} noValidate aria-label="Record a skin test" className="flex flex-col gap-3 rounded-lg p-3 ring-1 ring-ink/15">
        <p className="font-bold">Record a skin test</p>
        {formState.errors.root?.server && <FormAlert>{formState.errors.root.server.message}</FormAlert>}
        <div className="flex flex-wrap gap-3">
          <InstantField control={control} name="appliedAt" label="Applied at" zone={zone} error={err('appliedAt')} />
          <InstantField control={control} name="readAt" label="Read at" zone={zone} optional error={err('readAt')} />
          <SelectField label="Result" options={resultOptions} error={err('result')} {...register('result')} />
        </div>
        <TextField label="Product type tested" hint="e.g. permanent colour with 6 % developer" error={err('product')} {...register('product')} />
        <TextField label="Notes" error={err('notes')} {...register('notes')} />
        <div>
          <Button type="submit" variant="secondary" busy={formState.isSubmitting}>
            Record skin test
          </Button>
        </div>
      </form>
    </div>
  );
}
