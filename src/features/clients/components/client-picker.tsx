import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useDeferredValue, useId, useState } from 'react';
import type { ClientSummary } from '@shared/schemas/client.schemas';
import { Button } from '@client/components/ui/button';
import { clientQueries } from '../api/client-queries';
import { usePhoneText } from '../../salon';
import { ClientCreateForm } from './client-create-form';

type Props = { value: ClientSummary | null; onChange: (client: ClientSummary | null) => void; error?: string };

/** Choose the client for a booking or standby entry: search by name, phone or e-mail, or add one. */
export function ClientPicker({ value, onChange, error }: Props) {
  const phoneText = usePhoneText();
  const contact = (c: ClientSummary) => [c.phone && phoneText(c.phone), c.email].filter(Boolean).join(' · ');
  const [text, setText] = useState('');
  const [adding, setAdding] = useState(false);
  const inputId = useId();
  const q = useDeferredValue(text.trim());
  const results = useQuery({ ...clientQueries.list(q), enabled: !value && q.length >= 2, placeholderData: keepPreviousData });
  const clients = q.length >= 2 ? (results.data?.clients ?? []) : [];

  if (value) {
    return (
      <div className="flex flex-wrap items-center gap-3 rounded-lg bg-linen px-4 py-3">
        <p>
          <span className="font-bold">Client: {value.name}</span>
          {contact(value) && <span className="block text-sm text-ink/80">{contact(value)}</span>}
        </p>
        <Button variant="quiet" onClick={() => onChange(null)}>
          Change client
        </Button>
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-2">
      <label htmlFor={inputId} className="font-bold">
        Client
      </label>
      <input
        id={inputId}
        type="search"
        value={text}
        onChange={(event) => setText(event.target.value)}
        placeholder="Name, phone or e-mail"
        autoComplete="off"
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${inputId}-error` : undefined}
        className="min-h-11 rounded-lg border border-edge bg-white px-3 aria-invalid:border-brick"
      />
      {error && (
        <p id={`${inputId}-error`} className="text-sm font-bold text-brick">
          {error}
        </p>
      )}
      <p aria-live="polite" className="text-sm text-ink/80">
        {q.length >= 2 && !results.isFetching && `${clients.length} ${clients.length === 1 ? 'client' : 'clients'} found`}
        {results.isError && 'The search failed. Try again.'}
      </p>
      {clients.length > 0 && (
        <ul aria-label="Matching clients" className="divide-y divide-ink/10 rounded-lg bg-white ring-1 ring-ink/10">
          {clients.slice(0, 8).map((client) => (
            <li key={client.id}>
              <button type="button" onClick={() => onChange(client)} className="flex min-h-11 w-full flex-col px-3 py-2 text-left hover:bg-linen">
                <span className="font-bold">{client.name}</span>
                <span className="text-sm text-ink/80">{contact(client)}</span>
              </button>
            </li>
          ))}
        </ul>
      )}
      {adding ? (
        <ClientCreateForm initialName={text.trim()} onCreated={onChange} />
      ) : (
        <div>
          <Button variant="quiet" onClick={() => setAdding(true)}>
            + New client
          </Button>
        </div>
      )}
    </div>
  );
}
