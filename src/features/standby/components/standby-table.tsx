import { useMemo } from 'react';
import type { StandbyEntry } from '@shared/schemas/standby.schemas';
import { DataTable } from '@client/components/ui/data-table';
import { FormAlert } from '@client/components/ui/form-alert';
import { toastDone } from '@client/lib/toast';
import { useRemoveStandby } from '../api/standby-mutations';
import { usePhoneText } from '../../salon';
import { standbyColumns } from './standby-columns';

type Props = { entries: StandbyEntry[]; timeZone: string };

/** The standby list as a table: filter by any text, sort by a column header, page through. */
export function StandbyTable({ entries, timeZone }: Props) {
  const remove = useRemoveStandby();
  const phoneText = usePhoneText();
  const columns = useMemo(
    () =>
      standbyColumns(
        timeZone,
        phoneText,
        (entry) => remove.mutate(entry.id, { onSuccess: () => toastDone(`Removed ${entry.client.name} from the standby list.`) }),
        remove.isPending ? (remove.variables ?? null) : null,
      ),
    [timeZone, phoneText, remove],
  );
  return (
    <div className="flex flex-col gap-3">
      {remove.isError && <FormAlert>{remove.error.message}</FormAlert>}
      <DataTable
        label="Standby entries"
        rows={entries}
        columns={columns}
        filterHint="Name, service, stylist, day…"
        initialSort={[{ id: 'createdAt', desc: false }]}
        pageSize={20}
        empty="Nobody is on the standby list yet."
      />
    </div>
  );
}
