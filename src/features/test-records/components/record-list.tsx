import type { ReactNode } from 'react';
import { FormAlert } from '@client/components/ui/form-alert';

type Props<T> = {
  /** The list's accessible name, e.g. "Skin tests". */
  label: string;
  /** What to say when the client has none on record. */
  empty: string;
  /** The records, once loaded. */
  records: T[] | undefined;
  error: Error | null;
  itemClassName?: string;
  children: (record: T) => ReactNode;
};

/** A client's test records of one kind, newest first, with what to say while there are none or they failed to load. */
export function RecordList<T extends { id: string }>({ label, empty, records, error, itemClassName = 'rounded-lg bg-linen px-3 py-2', children }: Props<T>) {
  return (
    <>
      {error && <FormAlert>{error.message}</FormAlert>}
      {records && records.length === 0 && <p className="text-ink/80">{empty}</p>}
      <ul className="flex flex-col gap-2" aria-label={label}>
        {records?.map((record) => (
          <li key={record.id} className={itemClassName}>
            {children(record)}
          </li>
        ))}
      </ul>
    </>
  );
}
