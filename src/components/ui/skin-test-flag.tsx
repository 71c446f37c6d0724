import type { BookingView } from '@shared/schemas/booking-view.schemas';

type Props = { skinTest: BookingView['skinTest']; detailed?: boolean };

/**
 * A booking's skin-test footing where it matters: waiting on an unread test, or blocked by the client's record
 * (a reaction since, a lapsed test). Words carry the meaning; the border only adds emphasis.
 */
export function SkinTestFlag({ skinTest, detailed = false }: Props) {
  if (skinTest.status !== 'waiting' && skinTest.status !== 'blocked') return null;
  const blocked = skinTest.status === 'blocked';
  return (
    <span className={`inline-flex flex-col rounded-lg border-2 bg-white px-2 py-0.5 text-xs font-bold ${blocked ? 'border-brick text-brick' : 'border-amber'}`}>
      {blocked ? 'Skin test: colour blocked' : 'Waiting on a skin test'}
      {detailed && <span className="font-normal text-ink">{skinTest.message}</span>}
    </span>
  );
}
