import { useId, useState } from 'react';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';

type Props = { busy: boolean; onBook: (walkIn: { name: string; phone?: string }) => void };

/** A walk-in with no client record: a name (and a phone if they give one) is enough. */
export function WalkInFill({ busy, onBook }: Props) {
  const [name, setName] = useState('');
  const [phone, setPhone] = useState('');
  const [error, setError] = useState<string | undefined>();
  const headingId = useId();
  const book = () => {
    if (!name.trim()) return setError('Enter the walk-in’s name');
    setError(undefined);
    onBook({ name: name.trim(), phone: phone.trim() || undefined });
  };
  return (
    <div role="group" aria-labelledby={headingId} className="flex flex-col gap-3 rounded-lg bg-linen p-3">
      <h4 id={headingId} className="font-bold">
        Walk-in
      </h4>
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField label="Name" value={name} onChange={(e) => setName(e.target.value)} error={error} autoComplete="off" />
        <TextField label="Phone (optional)" type="tel" value={phone} onChange={(e) => setPhone(e.target.value)} autoComplete="off" />
      </div>
      <div>
        <Button variant="secondary" busy={busy} onClick={book}>
          Book walk-in
        </Button>
      </div>
    </div>
  );
}
