import { formatDuration } from '@shared/format/date-time';
import { Link } from 'react-router-dom';
import type { PublicSalon } from '@shared/schemas/online-booking.schemas';
import { buttonClasses } from '@client/components/ui/button';
import { paths } from '@client/config/paths';
import { formatMoney } from '@shared/money/money';
import { telHref } from '@shared/format/dial';

type Service = PublicSalon['services'][number];
type Props = { service: Service; slug: string; currency: string; phone: string; phoneText: string };

/** One item of the menu: what it is, how long, what it costs, what must come first, and how to book it. */
export function ServiceCard({ service, slug, currency, phone, phoneText }: Props) {
  const price = formatMoney(service.priceCents, currency);
  return (
    <article className="flex flex-col gap-2 rounded-xl bg-white p-4 ring-1 ring-ink/15">
      <h3 className="text-lg font-bold">{service.name}</h3>
      <p>{service.description}</p>
      <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm tabular">
        <dt className="font-bold">Typical time</dt>
        <dd>{formatDuration(service.typicalMinutes)}</dd>
        <dt className="font-bold">Price</dt>
        <dd>{service.priceIsFrom ? `from ${price}` : price}</dd>
        <dt className="font-bold">Deposit</dt>
        <dd>{service.depositCents > 0 ? formatMoney(service.depositCents, currency) : 'None'}</dd>
      </dl>
      {service.needsSkinTest && (
        <p className="rounded-lg border-l-4 border-amber bg-linen px-3 py-2 text-sm">
          <strong>Skin test first.</strong> This colour needs a skin test before the appointment (see the skin test policy), and usually a consultation.
        </p>
      )}
      {service.onlineBookable ? (
        <Link to={paths.salonBook(slug, service.id)} aria-label={`Book ${service.name}`} className={`${buttonClasses('primary')} self-start`}>
          Book
        </Link>
      ) : (
        <p className="text-sm text-ink/80">
          Booked with the salon after a consultation: call{' '}
          <a href={telHref(phone)} className="text-link">
            {phoneText}
          </a>
          .
        </p>
      )}
    </article>
  );
}
