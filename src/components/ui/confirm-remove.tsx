import { useEffect, useRef, useState } from 'react';
import { Button } from './button';

type Props = {
  /** What goes, in words: "Ana Moreno from the standby list", "this photo". */
  what: string;
  busy?: boolean;
  onRemove: () => void;
};

/**
 * A removal that asks first: "Remove" turns into the question with "Yes, remove" and "Keep". Focus goes to "Keep",
 * so a second press of Enter cannot remove by accident, and comes back to "Remove" when kept.
 */
export function ConfirmRemove({ what, busy = false, onRemove }: Props) {
  const [asking, setAsking] = useState(false);
  const keepRef = useRef<HTMLButtonElement>(null);
  const removeRef = useRef<HTMLButtonElement>(null);
  const wasAsking = useRef(false);
  useEffect(() => {
    if (asking) keepRef.current?.focus();
    else if (wasAsking.current) removeRef.current?.focus();
    wasAsking.current = asking;
  }, [asking]);
  if (!asking)
    return (
      <Button ref={removeRef} variant="quiet" aria-label={`Remove ${what}`} onClick={() => setAsking(true)}>
        Remove
      </Button>
    );
  return (
    <span role="group" aria-label={`Remove ${what}?`} className="inline-flex flex-wrap items-center gap-2">
      <span className="font-bold">Remove {what}?</span>
      <Button variant="secondary" busy={busy} onClick={onRemove}>
        Yes, remove
      </Button>
      <Button ref={keepRef} variant="quiet" onClick={() => setAsking(false)}>
        Keep
      </Button>
    </span>
  );
}
