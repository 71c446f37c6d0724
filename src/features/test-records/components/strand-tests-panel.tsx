import { useQuery } from '@tanstack/react-query';
import { urlOf } from '@shared/api/endpoint';
import { photosApi } from '@shared/api/photos.api';
import { RecordStrandTestSchema } from '@shared/schemas/strand-test.schemas';
import { RecordForm, useRecordForm } from '@client/components/ui/record-form';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { fieldError } from '@client/lib/form-errors';
import { productTypeLabels, productTypeOptions } from '@client/features/mix-log';
import { photoQueries } from '@client/features/photos';
import { testRecordQueries, useRecordStrandTest } from '../api/test-record-queries';
import { InstantField } from './instant-field';
import { RecordList } from './record-list';
import { formatDate } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { nowInZone } from '@client/lib/time';

const resultLabels = { passed: 'Passed', fragile: 'Lifted, but fragile', failed: 'Failed (broke or gummy)' } as const;
const resultOptions = Object.entries(resultLabels).map(([value, label]) => ({ value, label }));

/** The client's strand tests (what, developer, minutes, result, photo) and the form to record one. */
export function StrandTestsPanel({ clientId, zone }: { clientId: string; zone: string }) {
  const list = useQuery(testRecordQueries.strand(clientId));
  const photos = useQuery(photoQueries.list({ clientId }));
  const record = useRecordStrandTest(clientId);
  const { form, submit } = useRecordForm(
    RecordStrandTestSchema,
    { testedAt: nowInZone(zone), tested: '', productType: 'lightener', developerPercent: 6, minutes: 30, result: 'passed', notes: '', photoId: null },
    (body) => record.mutateAsync(body),
    ['testedAt', 'tested', 'productType', 'developerPercent', 'minutes', 'result', 'notes', 'photoId'],
  );
  const { register, control, formState } = form;
  const err = (path: string) => fieldError(formState.errors, path);
  const photoOptions = [
    { value: '', label: 'No photo' },
    ...(photos.data?.photos ?? []).map((p, i) => ({ value: p.id, label: `Photo ${i + 1} (${formatDate(p.createdAt, formatFor(zone), { width: 'short' })})` })),
  ];
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm">Lightening previously coloured or compromised hair risks breakage: a strand test is advised before the appointment.</p>
      <RecordList
        label="Strand tests"
        empty="No strand test on record."
        records={list.data?.tests}
        error={list.error}
        itemClassName="flex gap-3 rounded-lg bg-linen px-3 py-2"
      >
        {(t) => (
          <>
            {t.photoId && <img src={urlOf(photosApi.file, { params: { id: t.photoId } })} alt="The tested strand" className="size-16 rounded object-cover" />}
            <span>
              <span className="font-bold">{resultLabels[t.result]}</span> · {formatDate(t.testedAt, formatFor(zone), { width: 'short' })} · {t.tested} ·{' '}
              {productTypeLabels[t.productType]}
              {t.developerPercent !== null && ` with ${t.developerPercent} % developer`} · {t.minutes} min · by {t.recordedByName ?? 'the salon'}
              {t.notes && <span className="block text-sm">{t.notes}</span>}
            </span>
          </>
        )}
      </RecordList>
      <RecordForm
        label="Record a strand test"
        title="Record a strand test"
        submitLabel="Record strand test"
        busy={formState.isSubmitting}
        error={formState.errors.root?.server?.message}
        onSubmit={submit}
      >
        <TextField label="What was tested" hint="Product, mix and where (e.g. lightener 1:2 on a nape strand)" error={err('tested')} {...register('tested')} />
        <div className="flex flex-wrap gap-3">
          <InstantField control={control} name="testedAt" label="Tested at" zone={zone} error={err('testedAt')} />
          <SelectField label="Product type" options={productTypeOptions} error={err('productType')} {...register('productType')} />
          <TextField
            label="Developer %"
            type="number"
            step="0.1"
            inputMode="decimal"
            className="w-32"
            error={err('developerPercent')}
            {...register('developerPercent', { setValueAs: (v: string) => (v === '' ? null : Number(v)) })}
          />
          <TextField
            label="Minutes"
            type="number"
            inputMode="numeric"
            className="w-28"
            error={err('minutes')}
            {...register('minutes', { valueAsNumber: true })}
          />
          <SelectField label="Result" options={resultOptions} error={err('result')} {...register('result')} />
          <SelectField
            label="Photo"
            options={photoOptions}
            error={err('photoId')}
            {...register('photoId', { setValueAs: (v: string | null) => (v ? v : null) })}
          />
        </div>
        <TextField label="Notes" error={err('notes')} {...register('notes')} />
      </RecordForm>
    </div>
  );
}
