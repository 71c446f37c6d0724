import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { ClientNotesSchema, type ClientNotes } from '@shared/schemas/client.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { showServerErrors } from '@client/lib/form-errors';
import { toastDone } from '@client/lib/toast';
import { useUnsavedChangesGuard } from '@client/lib/use-unsaved-changes-guard';
import { useSaveClientNotes } from '../api/client-mutations';

/** The team's own notes on a client (the client does not see them), kept with the card. */
export function ClientNotesForm({ clientId, notes }: { clientId: string; notes: string }) {
  const save = useSaveClientNotes(clientId);
  const { register, handleSubmit, setError, reset, formState } = useForm<ClientNotes>({ resolver: zodResolver(ClientNotesSchema), defaultValues: { notes } });
  useUnsavedChangesGuard(formState.isDirty);
  const submit = handleSubmit((body) =>
    save.mutateAsync(body.notes).then(
      (saved) => {
        reset(saved);
        toastDone('Notes saved.');
      },
      (error) => showServerErrors(error, setError, ['notes']),
    ),
  );
  return (
    <form onSubmit={(e) => void submit(e)} noValidate aria-label="Notes" className="flex flex-col gap-3">
      {formState.errors.root?.server && <FormAlert>{formState.errors.root.server.message}</FormAlert>}
      <TextAreaField
        label="Notes for the team"
        rows={4}
        hint="What the next person should know: preferences, what worked last time. The client does not see these."
        error={formState.errors.notes?.message}
        {...register('notes')}
      />
      <div>
        <Button type="submit" variant="secondary" busy={save.isPending}>
          Save notes
        </Button>
      </div>
    </form>
  );
}
