import { RecordSkinTestReadingSchema, type SkinTest } from '@shared/schemas/skin-test.schemas';
import { RecordForm, useRecordForm } from '@client/components/ui/record-form';
import { SelectField } from '@client/components/ui/select-field';
import { fieldError } from '@client/lib/form-errors';
import { useRecordSkinTestReading } from '../api/test-record-queries';
import { InstantField } from './instant-field';
import { skinTestResultLabels } from './skin-test-result-labels';
import { nowInZone } from '@client/lib/time';

const readingOptions = RecordSkinTestReadingSchema.shape.result.options.map((value) => ({ value, label: skinTestResultLabels[value] }));

/** The reading of a test that was applied and not read yet: when it was read and what it showed (stored once). */
export function SkinTestReadingForm({ clientId, test, zone }: { clientId: string; test: SkinTest; zone: string }) {
  const record = useRecordSkinTestReading(clientId, test.id);
  // Once read, the test is no longer pending and the form goes away with it: nothing to clear.
  const { form, submit } = useRecordForm(
    RecordSkinTestReadingSchema,
    { readAt: nowInZone(zone), result: 'negative' },
    (body) => record.mutateAsync(body),
    ['readAt', 'result'],
    {
      clearWhenStored: false,
    },
  );
  const { control, register, formState } = form;
  const err = (path: string) => fieldError(formState.errors, path);
  return (
    <RecordForm
      label="Record the reading"
      submitLabel="Record the reading"
      busy={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onSubmit={submit}
      className="mt-2 flex flex-col gap-2"
    >
      <div className="flex flex-wrap gap-3">
        <InstantField control={control} name="readAt" label="Read at" zone={zone} error={err('readAt')} />
        <SelectField label="Result" options={readingOptions} error={err('result')} {...register('result')} />
      </div>
      <p className="text-sm">
        Itching, redness or swelling where the test was applied is a reaction: record it as positive. A reading is stored once, with your name, and cannot be
        changed afterwards.
      </p>
    </RecordForm>
  );
}
