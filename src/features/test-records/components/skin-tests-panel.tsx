import { useQuery } from '@tanstack/react-query';
import { RecordSkinTestSchema } from '@shared/schemas/skin-test.schemas';
import { Notice } from '@client/components/ui/notice';
import { RecordForm, useRecordForm } from '@client/components/ui/record-form';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { fieldError } from '@client/lib/form-errors';

import { testRecordQueries, useRecordSkinTest } from '../api/test-record-queries';
import { InstantField } from './instant-field';
import { RecordList } from './record-list';
import { SkinTestReadingForm } from './skin-test-reading-form';
import { ClearancePanel } from './clearance-panel';
import { sessionQueries } from '@client/features/auth';
import { skinTestResultLabels } from './skin-test-result-labels';
import { nowInZone } from '@client/lib/time';
import { formatDate, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

const resultOptions = Object.entries(skinTestResultLabels).map(([value, label]) => ({ value, label }));

/** The client's skin tests with who recorded and read them, the reading of a pending one, and the form to record one. */
export function SkinTestsPanel({ clientId, zone }: { clientId: string; zone: string }) {
  const list = useQuery(testRecordQueries.skin(clientId));
  const record = useRecordSkinTest(clientId);
  const { form, submit } = useRecordForm(
    RecordSkinTestSchema,
    { appliedAt: nowInZone(zone), readAt: null, result: 'pending', product: '', notes: '' },
    (body) => record.mutateAsync(body),
    ['appliedAt', 'readAt', 'result', 'product', 'notes'],
  );
  const { register, control, formState } = form;
  const err = (path: string) => fieldError(formState.errors, path);
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
          Do not colour with oxidative products; follow local regulations and licensed practice. Upcoming colour bookings of this client are flagged below:
          cancel them (the deposit is refunded in full) or change the plan to steps that need no skin test.
        </Notice>
      )}
      {!reaction && latestRead?.result === 'unclear' && (
        <Notice tone="danger" title="The latest skin test was unclear: a new test is needed before oxidative colour.">
          Upcoming colour bookings of this client are flagged below until a new test reads negative.
        </Notice>
      )}
      {reaction && <ClearancePanel clientId={clientId} zone={zone} clearances={clearances} canClear={session.data?.role === 'owner'} />}
      <RecordList label="Skin tests" empty="No skin test on record." records={list.data?.tests} error={list.error}>
        {(t) => (
          <>
            <span className="font-bold">{skinTestResultLabels[t.result]}</span> · applied {formatDate(t.appliedAt, formatFor(zone), { width: 'short' })}{' '}
            {formatTime(t.appliedAt, formatFor(zone))}
            {t.product && ` · ${t.product}`} · recorded by {t.recordedByName ?? 'the salon'}
            {t.readAt &&
              ` · read ${formatDate(t.readAt, formatFor(zone), { width: 'short' })} ${formatTime(t.readAt, formatFor(zone))} by ${t.readByName ?? 'the salon'}`}
            {t.notes && <span className="block text-sm">{t.notes}</span>}
            {t.result === 'pending' && <SkinTestReadingForm clientId={clientId} test={t} zone={zone} />}
          </>
        )}
      </RecordList>
      <RecordForm
        label="Record a skin test"
        title="Record a skin test"
        submitLabel="Record skin test"
        busy={formState.isSubmitting}
        error={formState.errors.root?.server?.message}
        onSubmit={submit}
      >
        <div className="flex flex-wrap gap-3">
          <InstantField control={control} name="appliedAt" label="Applied at" zone={zone} error={err('appliedAt')} />
          <InstantField control={control} name="readAt" label="Read at" zone={zone} optional error={err('readAt')} />
          <SelectField label="Result" options={resultOptions} error={err('result')} {...register('result')} />
        </div>
        <TextField label="Product type tested" hint="e.g. permanent colour with 6 % developer" error={err('product')} {...register('product')} />
        <TextField label="Notes" error={err('notes')} {...register('notes')} />
      </RecordForm>
    </div>
  );
}
