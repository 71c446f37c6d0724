import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextField } from '@client/components/ui/text-field';
import { ApiError } from '@client/lib/api-error';
import type { RecordOwner } from '@client/lib/record-owner';
import { ageQueries, useSetDateOfBirth } from '../api/age-queries';

/**
 * A date of birth (optional). Colour mixed with developer is labelled "not intended for use on persons under the age
 * of 16" (EU Cosmetics Regulation), so the salon needs to know.
 */
export function DateOfBirthForm({ owner }: { owner: RecordOwner }) {
  const age = useQuery(ageQueries.detail(owner));
  const save = useSetDateOfBirth(owner);
  const [draft, setDraft] = useState<string | null>(null);
  if (!age.data) return age.isError ? <FormAlert>{age.error.message}</FormAlert> : null;
  const value = draft ?? age.data.dateOfBirth ?? '';
  const fieldError = save.error instanceof ApiError ? (save.error.fields.dateOfBirth ?? save.error.message) : undefined;
  return (
    <form
      aria-label="Date of birth"
      className="flex flex-wrap items-end gap-3"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate(value || null, { onSuccess: () => setDraft(null) });
      }}
    >
      <TextField
        label="Date of birth"
        type="date"
        value={value}
        max={new Date().toISOString().slice(0, 10)}
        error={fieldError}
        onChange={(e) => setDraft(e.target.value)}
      />
      <Button type="submit" variant="secondary" busy={save.isPending}>
        Save date of birth
      </Button>
      {save.isSuccess && draft === null && (
        <p className="text-sm" role="status">
          Saved.
        </p>
      )}
    </form>
  );
}
