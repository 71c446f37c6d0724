import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { buttonClasses } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { LoadingState } from '@client/components/ui/loading-state';
import { formatDate } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { paths } from '@client/config/paths';
import { consultationQueries } from '../api/consultation-queries';
import { quoteStatusLabels } from './consultation-labels';
import { formatMoney } from '@shared/money/money';

type Props = { clientId: string; timeZone: string; currency: string };

/** A client's consultations and quotes, newest first, with the way to record a new one. */
export function ClientConsultations({ clientId, timeZone, currency }: Props) {
  const list = useQuery(consultationQueries.ofClient(clientId));
  return (
    <div className="flex flex-col gap-3">
      {list.isPending && <LoadingState label="Loading consultations…" />}
      {list.isError && <FormAlert>{list.error.message}</FormAlert>}
      {list.data && list.data.consultations.length === 0 && <p className="text-ink/80">No consultations yet.</p>}
      <ul className="flex flex-col gap-2">
        {list.data?.consultations.map((c) => (
          <li key={c.id} className="flex flex-wrap items-center justify-between gap-2 rounded-lg bg-linen px-3 py-2">
            <span>
              <span className="font-bold">{formatDate(c.createdAt, formatFor(timeZone), { width: 'short' })}</span> · levels {c.consultation.currentLevel} →{' '}
              {c.consultation.targetLevel} · {c.quote.stepPlan.sittings.length} {c.quote.stepPlan.sittings.length === 1 ? 'sitting' : 'sittings'} ·{' '}
              <span className="tabular">{formatMoney(c.quote.priceCents, currency)}</span> · {quoteStatusLabels[c.quote.status]}
              {c.quote.bookingIds.length > 0 && ' · booked'}
            </span>
            <Link to={paths.consultation(c.id)} className="text-link">
              Open quote
            </Link>
          </li>
        ))}
      </ul>
      <div>
        <Link to={paths.newConsultation(clientId)} className={buttonClasses('secondary')}>
          New consultation
        </Link>
      </div>
    </div>
  );
}
