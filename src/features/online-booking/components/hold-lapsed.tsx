import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';

type Props = { onPickAgain: () => void };

/** The hold ran out (or was released) before the booking was paid: the time is free for others again. */
export function HoldLapsed({ onPickAgain }: Props) {
  return (
    <Notice
      tone="caution"
      title="Your held time was released"
      action={
        <div>
          <Button onClick={onPickAgain}>Pick a time again</Button>
        </div>
      }
    >
      <p>
        The time was kept for a few minutes and is free for others again: its minutes ran out, or it was released. If any payment went through for it, it has
        been refunded.
      </p>
    </Notice>
  );
}
