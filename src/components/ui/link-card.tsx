import { useId, type ReactNode } from 'react';
import { formatDate, formatTime, formatZone } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

type Props = {
  salonName: string;
  title: string;
  /** The visit the link is about. */
  visit: { serviceName: string; stylistName: string; start: string; timeZone: string };
  /** More rows of the visit's list (`dt`/`dd` pairs). */
  facts?: ReactNode;
  /** What the person can do from here. */
  children: ReactNode;
};

/**
 * A page opened from a link in an SMS or e-mail, without signing in (the link's token is the key): the salon, what
 * it is about, the visit (service, stylist, when in salon time), and what to do.
 */
export function LinkCard({ salonName, title, visit, facts, children }: Props) {
  const headingId = useId();
  const ctx = formatFor(visit.timeZone);
  return (
    <article aria-labelledby={headingId} className="mx-auto flex w-full max-w-md flex-col gap-4 rounded-2xl bg-white p-5 shadow-sm ring-1 ring-ink/10">
      <p className="text-sm font-bold text-ink/80">{salonName}</p>
      <h1 id={headingId} className="text-2xl font-extrabold tracking-tight">
        {title}
      </h1>
      <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-2">
        <dt className="font-bold">Service</dt>
        <dd>{visit.serviceName}</dd>
        <dt className="font-bold">With</dt>
        <dd>{visit.stylistName}</dd>
        <dt className="font-bold">When</dt>
        <dd>
          {formatDate(visit.start, ctx, { width: 'short' })}, <span className="tabular">{formatTime(visit.start, ctx)}</span>
          <span className="block text-sm text-ink/80">Salon time: {formatZone(ctx, visit.start.slice(0, 10))}</span>
        </dd>
        {facts}
      </dl>
      {children}
    </article>
  );
}
