import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useDeferredValue, useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@client/config/paths';
import { usePhoneText } from '../../salon';
import { clientQueries } from '../api/client-queries';

/** Find a client by name, e-mail or phone; results update as you type. */
export function ClientSearch() {
  const phoneText = usePhoneText();
  const [text, setText] = useState('');
  // Deferred so fast typing does not send a request per keystroke while rendering.
  const q = useDeferredValue(text.trim());
  const results = useQuery({ ...clientQueries.list(q), enabled: q.length >= 2, placeholderData: keepPreviousData });
  const clients = q.length >= 2 ? (results.data?.clients ?? []) : [];

  return (
    <div role="search" className="flex flex-col gap-3">
      <label htmlFor="client-search" className="font-bold">
        Find a client
      </label>
      <input
        id="client-search"
        type="search"
        value={text}
        onChange={(event) => setText(event.target.value)}
        placeholder="Name, e-mail or phone"
        autoComplete="off"
        className="min-h-11 rounded-lg border border-edge bg-white px-3"
      />
      <div aria-live="polite" className="text-sm text-ink/80">
        {q.length >= 2 && !results.isFetching && `${clients.length} ${clients.length === 1 ? 'client' : 'clients'} found`}
        {results.isError && 'The search failed. Try again.'}
      </div>
      {clients.length > 0 && (
        <ul className="divide-y divide-ink/10 rounded-lg bg-white ring-1 ring-ink/10">
          {clients.map((client) => (
            <li key={client.id}>
              <Link to={paths.deskClient(client.id)} className="flex flex-col px-3 py-2 hover:bg-linen">
                <span className="text-link">{client.name}</span>
                <span className="text-sm text-ink/80">{[client.email, client.phone && phoneText(client.phone)].filter(Boolean).join(' · ')}</span>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
