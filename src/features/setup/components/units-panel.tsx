import { createColumnHelper } from '@tanstack/react-table';
import { useState } from 'react';
import type { Unit, UnitKind } from '@shared/schemas/setup.schemas';
import { Button } from '@client/components/ui/button';
import { DataTable } from '@client/components/ui/data-table';
import { FormAlert } from '@client/components/ui/form-alert';
import { formatDate } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { useAddUnit, useBackInService, useRenameUnit } from '../api/setup-mutations';
import { OutOfServiceForm } from './out-of-service-form';
import { UnitNameForm } from './unit-name-form';

type Props = { kind: UnitKind; units: Unit[]; timeZone: string };
const words = { chairs: { one: 'chair', title: 'Chairs' }, basins: { one: 'basin', title: 'Basins' } } as const;
const col = createColumnHelper<Unit>();

/** The salon's chairs or basins: add, rename, and out-of-service periods. */
export function UnitsPanel({ kind, units, timeZone }: Props) {
  const add = useAddUnit();
  const rename = useRenameUnit();
  const back = useBackInService();
  const [picked, setPicked] = useState<{ id: string; action: 'rename' | 'close' } | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const unit = units.find((u) => u.id === picked?.id);
  const lastDay = (iso: string) => formatDate(new Date(new Date(iso).getTime() - 60_000).toISOString(), formatFor(timeZone), { width: 'short' });
  const columns = [
    col.accessor('name', { header: 'Name' }),
    col.accessor((u) => u.outOfService.map((p) => `${formatDate(p.start, formatFor(timeZone), { width: 'short' })} – ${lastDay(p.end)}`).join('; '), {
      id: 'outOfService',
      header: 'Out of service',
      cell: (c) =>
        c.row.original.outOfService.length === 0 ? (
          'in service'
        ) : (
          <ul>
            {c.row.original.outOfService.map((p) => (
              <li key={p.id}>
                {formatDate(p.start, formatFor(timeZone), { width: 'short' })} – {lastDay(p.end)} {p.reason && `· ${p.reason}`}{' '}
                <Button variant="quiet" onClick={() => back.mutate({ kind, id: c.row.original.id, entryId: p.id })}>
                  Back in service
                </Button>
              </li>
            ))}
          </ul>
        ),
    }),
    col.display({
      id: 'actions',
      header: () => <span className="sr-only">Actions</span>,
      cell: (c) => (
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" aria-label={`Rename ${c.row.original.name}`} onClick={() => setPicked({ id: c.row.original.id, action: 'rename' })}>
            Rename
          </Button>
          <Button
            variant="secondary"
            aria-label={`Take ${c.row.original.name} out of service`}
            onClick={() => setPicked({ id: c.row.original.id, action: 'close' })}
          >
            Out of service…
          </Button>
        </div>
      ),
    }),
  ];
  const done = (message: string) => {
    setNotice(message);
    setPicked(null);
  };
  return (
    <div className="flex flex-col gap-4">
      {notice && <FormAlert tone="success">{notice}</FormAlert>}
      <DataTable
        label={words[kind].title}
        rows={units}
        columns={columns}
        filterHint="Name…"
        initialSort={[{ id: 'name', desc: false }]}
        empty={`No ${kind} yet.`}
      />
      {unit && picked?.action === 'rename' && (
        <UnitNameForm
          key={unit.id}
          label={`New name for ${unit.name}`}
          submitLabel="Rename"
          initial={unit.name}
          onSave={(name) => rename.mutateAsync({ kind, id: unit.id, name }).then(() => done(`Renamed to ${name}.`))}
        />
      )}
      {unit && picked?.action === 'close' && <OutOfServiceForm key={unit.id} kind={kind} unit={unit} timeZone={timeZone} onDone={done} />}
      <UnitNameForm
        label={`New ${words[kind].one}`}
        submitLabel={`Add ${words[kind].one}`}
        onSave={(name) => add.mutateAsync({ kind, name }).then(() => setNotice(`${name} is added.`))}
      />
    </div>
  );
}
