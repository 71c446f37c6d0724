import { useQuery } from '@tanstack/react-query';
import { RecordGuardianConsentSchema } from '@shared/schemas/age.schemas';
import { ageOn, MIN_AGE_WITHOUT_CONSENT } from '@shared/rules/age-rule';
import { Notice } from '@client/components/ui/notice';
import { RecordForm, useRecordForm } from '@client/components/ui/record-form';
import { TextField } from '@client/components/ui/text-field';
import { fieldError } from '@client/lib/form-errors';
import { todayIn } from '@client/lib/time';
import { ageQueries, useRecordGuardianConsent } from '../api/age-queries';
import { DateOfBirthForm } from './date-of-birth-form';
import { formatDate } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

type Props = { clientId: string; zone: string };

/** The client card's age section: date of birth, and for a client under 16 the guardian consents on record. */
export function GuardianConsentPanel({ clientId, zone }: Props) {
  const age = useQuery(ageQueries.detail({ clientId }));
  const record = useRecordGuardianConsent(clientId);
  const { form, submit } = useRecordForm(RecordGuardianConsentSchema, { guardianName: '', relationship: '', note: '' }, (body) => record.mutateAsync(body), [
    'guardianName',
    'relationship',
    'note',
  ]);
  const dob = age.data?.dateOfBirth ?? null;
  const under = dob !== null && ageOn(dob, todayIn(zone)) < MIN_AGE_WITHOUT_CONSENT;
  const err = (name: string) => fieldError(form.formState.errors, name);
  return (
    <div className="flex flex-col gap-4">
      <DateOfBirthForm owner={{ clientId }} />
      {under && (
        <Notice tone="caution" title={`Under ${MIN_AGE_WITHOUT_CONSENT} today`}>
          Oxidative colour is labelled as not intended for anyone under 16. It cannot be booked online; the desk may book it only with a guardian’s consent on
          record. Follow your local rules and licensed practice.
        </Notice>
      )}
      {age.data && age.data.guardianConsents.length > 0 && (
        <ul aria-label="Guardian consents" className="flex flex-col gap-1 text-sm">
          {age.data.guardianConsents.map((c) => (
            <li key={c.id}>
              <span className="font-bold">{c.guardianName}</span> ({c.relationship}) consented · recorded{' '}
              {formatDate(c.recordedAt, formatFor(zone), { width: 'short' })} by {c.recordedByName}
              {c.note && ` · ${c.note}`}
            </li>
          ))}
        </ul>
      )}
      {under && (
        <RecordForm
          label="Record a guardian's consent"
          submitLabel="Record consent"
          busy={form.formState.isSubmitting}
          error={form.formState.errors.root?.server?.message}
          onSubmit={submit}
        >
          <div className="flex flex-wrap gap-3">
            <TextField label="Guardian’s name" error={err('guardianName')} {...form.register('guardianName')} />
            <TextField label="Related as" hint="e.g. mother, legal guardian" error={err('relationship')} {...form.register('relationship')} />
          </div>
          <TextField label="Note" hint="How the consent was given, e.g. signed form on file" error={err('note')} {...form.register('note')} />
        </RecordForm>
      )}
    </div>
  );
}
