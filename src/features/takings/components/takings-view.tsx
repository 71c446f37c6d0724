import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useState, type FormEvent, type ReactNode } from 'react';
import type { Takings } from '@shared/schemas/takings.schemas';
import { Button } from '@client/components/ui/button';
import { DateStepper } from '@client/components/ui/date-stepper';
import { FormAlert } from '@client/components/ui/form-alert';
import { PageHeader } from '@client/components/ui/page-header';
import { SectionCard } from '@client/components/ui/section-card';
import { TextField } from '@client/components/ui/text-field';
import { TimeZoneNote } from '@client/components/ui/time-zone-note';
import { sessionQueries } from '@client/features/auth';
import { downloadCsv } from '@client/lib/csv';
import { todayIn } from '@client/lib/time';
import { formatDate, formatDateTime } from '@shared/format/date-time';
import { formatFor, zonelessFormat } from '@shared/format/locale';
import { formatMoney, parseMoney } from '@shared/money/money';
import { takingsQueries, useCloseDay, useReopenDay } from '../api/takings-queries';
import { takingsCsv } from '../takings-csv';

type Props = { date: string; hrefFor: (date: string) => string; onPick: (date: string) => void };

/** A table of label → amount rows, figures on the right. */
function Figures({ label, head, rows }: { label: string; head: string[]; rows: [string, ...ReactNode[]][] }) {
  return (
    <div role="region" aria-label={label} tabIndex={0} className="overflow-x-auto rounded-xl ring-1 ring-ink/10">
      {/* Tighter cells on a phone, so the four money columns fit a 375 px card without scrolling. */}
      <table className="w-full border-collapse bg-white text-left text-sm sm:text-base">
        <thead className="bg-linen">
          <tr>
            {head.map((h, i) => (
              <th key={h} scope="col" className={`px-2 py-2 sm:px-3 ${i > 0 ? 'text-right' : ''}`}>
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map(([name, ...cells]) => (
            <tr key={name} className="border-t border-ink/10">
              <th scope="row" className="px-2 py-2 font-normal sm:px-3">
                {name}
              </th>
              {cells.map((c, i) => (
                <td key={i} className="tabular px-2 py-2 text-right sm:px-3">
                  {c}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

const differenceWords = (cents: number, money: (c: number) => string) =>
  cents === 0 ? 'No difference' : cents < 0 ? `${money(-cents)} short` : `${money(cents)} over`;

/**
 * The day's takings at the desk (docs/money.md, "Takings"): totals by method, deposits taken, applied and refunded,
 * balances, refunds, tips per stylist, cash expected; the desk counts the drawer and closes the day once (the owner
 * may reopen it); the whole day as a CSV.
 */
export function TakingsView({ date, hrefFor, onPick }: Props) {
  const { data: t } = useSuspenseQuery(takingsQueries.day(date));
  const session = useQuery(sessionQueries.current());
  const isOwner = session.data?.role === 'owner';
  const money = (cents: number) => formatMoney(cents, t.currency);
  const ctx = formatFor(t.timeZone);
  const today = todayIn(t.timeZone);
  return (
    <>
      <PageHeader
        title="Takings"
        subtitle={
          <>
            <p>{formatDate(t.date, zonelessFormat)}</p>
            <TimeZoneNote timeZone={t.timeZone} date={t.date} />
          </>
        }
        action={
          <Button variant="secondary" onClick={() => downloadCsv(`dwell-takings-${t.date}.csv`, takingsCsv(t))}>
            Download CSV
          </Button>
        }
      />
      <div className="flex flex-col gap-6">
        <DateStepper date={t.date} today={today} hrefFor={hrefFor} onPick={onPick} />
        <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
          <SectionCard title="By method">
            <Figures
              label="Takings by method"
              head={['Method', 'In', 'Refunded', 'Net']}
              rows={[
                ['Card', money(t.byMethod.card.inCents), money(t.byMethod.card.refundedCents), money(t.byMethod.card.netCents)],
                ['Cash', money(t.byMethod.cash.inCents), money(t.byMethod.cash.refundedCents), money(t.byMethod.cash.netCents)],
                [
                  'All methods',
                  money(t.byMethod.card.inCents + t.byMethod.cash.inCents),
                  money(t.refundsCents),
                  money(t.byMethod.card.netCents + t.byMethod.cash.netCents),
                ],
              ]}
            />
          </SectionCard>
          <SectionCard title="What came in">
            <Figures
              label="Deposits, balances, refunds and tips"
              head={['', 'Amount']}
              rows={[
                ['Deposits taken', money(t.deposits.takenCents)],
                ['Deposits applied at checkout', money(t.deposits.appliedCents)],
                ['Deposits refunded', money(t.deposits.refundedCents)],
                ['Balances paid at checkout', money(t.balancesCents)],
                ['Refunds (all)', money(t.refundsCents)],
                ['Tips', money(t.tipsCents)],
              ]}
            />
          </SectionCard>
          <SectionCard title="Tips per stylist">
            {t.tipsByStylist.length === 0 ? (
              <p>No tips this day.</p>
            ) : (
              <Figures label="Tips per stylist" head={['Stylist', 'Tips']} rows={t.tipsByStylist.map((s) => [s.name, money(s.tipsCents)])} />
            )}
          </SectionCard>
          <SectionCard title="Cash and the close">
            <CashClose takings={t} isOwner={isOwner} notBegun={t.date > today} money={money} ctx={ctx} />
          </SectionCard>
        </div>
        {t.reopened.length > 0 && (
          <SectionCard title="Earlier closes, reopened">
            <ul className="flex flex-col gap-1">
              {t.reopened.map((c) => (
                <li key={c.closedAt} className="rounded-lg bg-linen px-3 py-2">
                  Counted <span className="tabular">{money(c.countedCashCents)}</span> against <span className="tabular">{money(c.expectedCashCents)}</span> (
                  {differenceWords(c.differenceCents, money)}), closed by {c.closedBy ?? 'someone no longer here'}; reopened by{' '}
                  {c.reopenedBy ?? 'someone no longer here'}{' '}
                  <span className="tabular">{c.reopenedAt && formatDateTime(c.reopenedAt, ctx, { year: false })}</span>
                </li>
              ))}
            </ul>
          </SectionCard>
        )}
      </div>
    </>
  );
}

type CloseProps = { takings: Takings; isOwner: boolean; notBegun: boolean; money: (c: number) => string; ctx: ReturnType<typeof formatFor> };

/** Cash expected from the day's payments, and either the close as made or the form that makes it. */
function CashClose({ takings: t, isOwner, notBegun, money, ctx }: CloseProps) {
  const close = useCloseDay();
  const reopen = useReopenDay();
  const [counted, setCounted] = useState('');
  const [note, setNote] = useState('');
  const [countError, setCountError] = useState<string>();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const cents = parseMoney(counted, t.currency);
    if (cents === null || cents < 0) return setCountError('Enter the cash counted in the drawer, like 120.50');
    setCountError(undefined);
    close.mutate({ date: t.date, countedCashCents: cents, note });
  };
  return (
    <div className="flex flex-col gap-3">
      <p>
        Cash expected: <span className="tabular font-bold">{money(t.expectedCashCents)}</span>
        <span className="block text-sm text-ink/80">Cash taken less cash handed back this day; the drawer&apos;s float is not counted.</span>
      </p>
      {close.isError && <FormAlert>{close.error.message}</FormAlert>}
      {reopen.isError && <FormAlert>{reopen.error.message}</FormAlert>}
      {t.close ? (
        <>
          <p role="status" className="rounded-lg bg-linen px-3 py-2">
            Day closed: counted <span className="tabular font-bold">{money(t.close.countedCashCents)}</span> ·{' '}
            <span className="font-bold">{differenceWords(t.close.differenceCents, money)}</span> · by {t.close.closedBy ?? 'someone no longer here'},{' '}
            <span className="tabular">{formatDateTime(t.close.closedAt, ctx, { year: false })}</span>
            {t.close.note && <span className="block text-sm">{t.close.note}</span>}
          </p>
          {isOwner && (
            <div>
              <Button variant="secondary" busy={reopen.isPending} onClick={() => reopen.mutate(t.date)}>
                Reopen the day
              </Button>
            </div>
          )}
        </>
      ) : notBegun ? (
        <p>This day has not begun; it can be closed once it has.</p>
      ) : (
        <form aria-label="Close the day" onSubmit={submit} className="flex flex-col gap-3">
          <TextField
            label={`Cash counted (${t.currency})`}
            inputMode="decimal"
            value={counted}
            error={countError}
            onChange={(e) => setCounted(e.target.value)}
          />
          <TextField label="Note (optional)" maxLength={300} value={note} onChange={(e) => setNote(e.target.value)} />
          <div>
            <Button type="submit" busy={close.isPending}>
              Close the day
            </Button>
          </div>
        </form>
      )}
    </div>
  );
}
