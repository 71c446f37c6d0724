import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { RecordClearanceSchema, type SkinTestClearance } from '../../../../shared/schemas/skin-test.schemas';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { fieldError, showServerErrors } from '../../../lib/form-errors';
import { formatDate } from '../../../../shared/format/date-time';
import { formatFor } from '../../../../shared/format/locale';
import { useRecordClearance } from '../api/test-record-queries';

type Props = { clientId: string; zone: string; clearances: SkinTestClearance[]; canClear: boolean };

/**
 * Clearances of a positive skin test: who decided, when and why. Only the owner may record one; colour still needs a
 * newer test read negative afterwards.
 */
export function ClearancePanel({ clientId, zone, clearances, canClear }: Props) {
  const record = useRecordClearance(clientId);
  const form = useForm<z.input<typeof RecordClearanceSchema>>({ resolver: zodResolver(RecordClearanceSchema), defaultValues: { reason: '' } });
  const submit = form.handleSubmit((body) => record.mutateAsync(body).then(() => form.reset(), (e) => showServerErrors(e, form.setError, ['reason'])));
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
        <form onSubmit={(e) => void submit(e)} noValidate aria-label="Record a clearance" className="flex flex-col gap-2 rounded-lg p-3 ring-1 ring-brick/40">
          {form.formState.errors.root?.server && <FormAlert>{form.formState.errors.root.server.message}</FormAlert>}
          <TextAreaField
            label="Why oxidative colour may follow this reaction"
            hint="For example the written advice of the client's doctor. Kept for good with your name; a new skin test must still read negative."
            error={fieldError(form.formState.errors, 'reason')}
            {...form.register('reason')}
          />
          <div>
            <Button type="submit" variant="secondary" busy={form.formState.isSubmitting}>
              Record a clearance
            </Button>
          </div>
        </form>
      ) : (
        <p className="text-sm text-ink/80">Only the owner can record a clearance.</p>
      )}
    </div>
  );
}
