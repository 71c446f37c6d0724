import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { useReleaseHold } from '../api/hold-mutations';

type Props = { holdId: string; secret: string; onReleased: () => void };

/** Frees the held time at once, for a client who wants another time (only one can be held at a time). */
export function ReleaseHeldTime({ holdId, secret, onReleased }: Props) {
  const release = useReleaseHold();
  return (
    <div className="flex flex-col gap-2">
      {release.isError && release.error.code !== 'HOLD_LAPSED' && <FormAlert>{release.error.message}</FormAlert>}
      <Button
        variant="secondary"
        className="self-start"
        busy={release.isPending}
        // Already gone (lapsed or released elsewhere) is what the client wanted too.
        onClick={() => release.mutate({ holdId, secret }, { onSuccess: onReleased, onError: (e) => e.code === 'HOLD_LAPSED' && onReleased() })}
      >
        Release this time and pick another
      </Button>
    </div>
  );
}
