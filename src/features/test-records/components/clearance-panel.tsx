import { RecordClearanceSchema, type SkinTestClearance } from '@shared/schemas/skin-test.schemas';
import { RecordForm, useRecordForm } from '@client/components/ui/record-form';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { fieldError } from '@client/lib/form-errors';
import { useRecordClearance } from '../api/test-record-queries';
import { formatDate } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

type Props = { clientId: string; zone: string; clearances: SkinTestClearance[]; canClear: boolean };

/**
 * Clearances of a positive skin test: who decided, when and why. Only the owner may record one; colour still needs a
 * newer test read negative afterwards.
 */
export function ClearancePanel({ clientId, zone, clearances, canClear }: Props) {
  const record = useRecordClearance(clientId);
  const { form, submit } = useRecordForm(RecordClearanceSchema, { reason: '' }, (body) => record.mutateAsync(body), ['reason']);
  return (
    <div className="flex flex-col gap-2">
      {clearances.length > 0 && (
        <ul aria-label="Clearances" className="flex flex-col gap-1 text-sm">
          {clearances.map((c) => (
            <li key={c.id}>
              <span className="font-bold">Cleared</span> {formatDate(c.recordedAt, formatFor(zone), { width: 'short' })} by {c.recordedByName}: {c.reason}
            </li>
          ))}
        </ul>
      )}
      {canClear ? (
        <RecordForm
          label="Record a clearance"
          submitLabel="Record a clearance"
          busy={form.formState.isSubmitting}
          error={form.formState.errors.root?.server?.message}
          onSubmit={submit}
          className="flex flex-col gap-2 rounded-lg p-3 ring-1 ring-brick/40"
        >
          <TextAreaField
            label="Why oxidative colour may follow this reaction"
            hint="For example the written advice of the client's doctor. Kept for good with your name; a new skin test must still read negative."
            error={fieldError(form.formState.errors, 'reason')}
            {...form.register('reason')}
          />
        </RecordForm>
      ) : (
        <p className="text-sm text-ink/80">Only the owner can record a clearance.</p>
      )}
    </div>
  );
}
