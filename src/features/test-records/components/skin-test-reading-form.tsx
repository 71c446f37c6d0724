import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { RecordSkinTestReadingSchema, type RecordSkinTestReading, type SkinTest } from '../../../../shared/schemas/skin-test.schemas';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { SelectField } from '../../../components/ui/select-field';
import { fieldError, showServerErrors } from '../../../lib/form-errors';
import { useRecordSkinTestReading } from '../api/test-record-queries';
import { InstantField } from './instant-field';
import { skinTestResultLabels } from './skin-test-result-labels';
import { nowInZone } from '../../../lib/time';

const readingOptions = RecordSkinTestReadingSchema.shape.result.options.map((value) => ({ value, label: skinTestResultLabels[value] }));

/** The reading of a test that was applied and not read yet: when it was read and what it showed (stored once). */
export function SkinTestReadingForm({ clientId, test, zone }: { clientId: string; test: SkinTest; zone: string }) {
  const record = useRecordSkinTestReading(clientId, test.id);
  const now = nowInZone(zone);
  const { control, register, handleSubmit, setError, formState } = useForm<RecordSkinTestReading>({
    resolver: zodResolver(RecordSkinTestReadingSchema),
    defaultValues: { readAt: now, result: 'negative' },
  });
  const err = (path: string) => fieldError(formState.errors, path);
  const submit = handleSubmit((body) => record.mutateAsync(body).catch((e: unknown) => showServerErrors(e, setError, ['readAt', 'result'])));
  return (
    <form onSubmit={(e) => void submit(e)} noValidate aria-label="Record the reading" className="mt-2 flex flex-col gap-2">
      {formState.errors.root?.server && <FormAlert>{formState.errors.root.server.message}</FormAlert>}
      <div className="flex flex-wrap gap-3">
        <InstantField control={control} name="readAt" label="Read at" zone={zone} error={err('readAt')} />
        <SelectField label="Result" options={readingOptions} error={err('result')} {...register('result')} />
      </div>
      <p className="text-sm">Itching, redness or swelling where the test was applied is a reaction: record it as positive. A reading is stored once, with your name, and cannot be changed afterwards.</p>
      <div>
        <Button type="submit" variant="secondary" busy={formState.isSubmitting}>
          Record the reading
        </Button>
      </div>
    </form>
  );
}
