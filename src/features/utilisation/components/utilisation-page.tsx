import { useSuspenseQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { DeskUtilisation, UtilisationQuery } from '@shared/schemas/utilisation.schemas';
import { PageHeader } from '@client/components/ui/page-header';
import { formatDate, formatZone } from '@shared/format/date-time';
import { shiftLocalDate } from '@shared/time/salon-time';
import { formatFor, zonelessFormat } from '@shared/format/locale';
import { Button } from '@client/components/ui/button';
import { queryFromSearch, scenarioExportUrl, utilisationQueries } from '../api/utilisation-queries';
import { OccupancyHeatMap } from './occupancy-heat-map';
import { PeriodPicker } from './period-picker';
import { ServicesTable } from './services-table';
import { StylistBars } from './stylist-bars';
import { OnTimeByStylist } from './on-time-by-stylist';
import { TimekeepingSummary } from './timekeeping-summary';
import { UtilisationSummary } from './utilisation-summary';
import { WeeklyTrend } from './weekly-trend';

/** The period in the page's URL (`?period=&date=&from=&to=`), and a way to change it. */
function usePeriodQuery(): [UtilisationQuery, (next: UtilisationQuery) => void] {
  const [search, setSearch] = useSearchParams();
  const set = (next: UtilisationQuery) => {
    const params = new URLSearchParams();
    for (const [key, value] of Object.entries(next)) if (value) params.set(key, value);
    setSearch(params);
  };
  return [queryFromSearch(search), set];
}

type FrameProps = {
  title: string;
  report: DeskUtilisation;
  query: UtilisationQuery;
  onQuery: (q: UtilisationQuery) => void;
  actions?: ReactNode;
  children: ReactNode;
};

/** Heading, period picker and the period in words; the figures go below. */
function Frame({ title, report, query, onQuery, actions, children }: FrameProps) {
  const last = shiftLocalDate(report.period.to, -1);
  const span =
    report.period.days === 1
      ? formatDate(report.period.from, zonelessFormat)
      : `${formatDate(report.period.from, zonelessFormat)} to ${formatDate(last, zonelessFormat)}`;
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title={title}
        subtitle={
          <p>
            {report.salon.name} · {span} · salon time, {formatZone(formatFor(report.salon.timeZone), report.period.from)}
          </p>
        }
        action={
          // The page has a print layout (main.css): figures and tables without the site's frame.
          <Button variant="secondary" className="print:hidden" onClick={() => window.print()}>
            Print
          </Button>
        }
      />
      {/* The key resets the form when the URL's period changes (back button, a shared link). */}
      <PeriodPicker key={JSON.stringify(query)} value={query} onChange={onQuery} />
      {actions}
      {children}
    </div>
  );
}

// The period's own days: `to` is the day after the last one.
const slug = (r: DeskUtilisation) => `${r.period.from}-to-${shiftLocalDate(r.period.to, -1)}`;

export function OwnerUtilisationView() {
  const [query, setQuery] = usePeriodQuery();
  const { data: report } = useSuspenseQuery(utilisationQueries.owner(query));
  const currency = report.salon.currency;
  const actions = (
    <p className="print:hidden">
      {report.period.scenarios === 1 ? (
        <a className="text-link" href={scenarioExportUrl(query)} download>
          Download the engine scenario (JSON)
        </a>
      ) : (
        <span className="text-ink/80">
          The engine measured this period in {report.period.scenarios} scenarios of at most 120 days; pick a shorter period to download one.
        </span>
      )}
      <span className="ml-2 text-sm text-ink/80">The file lets a developer re-check these occupancy figures with Dwell's planning engine on its own.</span>
    </p>
  );
  return (
    <Frame title="Utilisation" report={report} query={query} onQuery={setQuery} actions={actions}>
      <UtilisationSummary report={report} currency={currency} />
      <OccupancyHeatMap cells={report.heatMap} filename={`chair-occupancy-by-hour-${slug(report)}.csv`} />
      <StylistBars stylists={report.stylists} currency={currency} filename={`stylists-${slug(report)}.csv`} />
      <TimekeepingSummary timekeeping={report.timekeeping}>
        <OnTimeByStylist stylists={report.timekeeping.stylists} filename={`on-time-${slug(report)}.csv`} />
      </TimekeepingSummary>
      <WeeklyTrend weeks={report.weeks} currency={currency} filename={`weeks-${slug(report)}.csv`} />
      <ServicesTable services={report.topServices} currency={currency} filename={`services-${slug(report)}.csv`} />
    </Frame>
  );
}

export function DeskUtilisationView() {
  const [query, setQuery] = usePeriodQuery();
  const { data: report } = useSuspenseQuery(utilisationQueries.desk(query));
  return (
    <Frame title="Chair use" report={report} query={query} onQuery={setQuery}>
      <UtilisationSummary report={report} />
      <OccupancyHeatMap cells={report.heatMap} filename={`chair-occupancy-by-hour-${slug(report)}.csv`} />
      <TimekeepingSummary timekeeping={report.timekeeping} />
      <WeeklyTrend weeks={report.weeks} filename={`weeks-${slug(report)}.csv`} />
      <ServicesTable services={report.topServices} filename={`services-${slug(report)}.csv`} />
    </Frame>
  );
}
