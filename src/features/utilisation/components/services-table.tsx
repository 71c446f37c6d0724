import { formatDuration } from '@shared/format/date-time';
import { SectionCard } from '@client/components/ui/section-card';
import { FigureTable, type FigureColumn } from './figure-table';
import { formatMoney, minorToUnits } from '@shared/money/money';

interface ServiceRow {
  serviceId: string;
  name: string;
  chairMinutes: number;
  sittings: number;
  revenueCents?: number;
}

type Props = { services: ServiceRow[]; filename: string; currency?: string };

/** The services that held chairs longest in the period. */
export function ServicesTable({ services, filename, currency }: Props) {
  const columns: FigureColumn<ServiceRow>[] = [
    { id: 'name', header: 'Service', value: (s) => s.name },
    { id: 'chairMinutes', header: 'Chair time', value: (s) => s.chairMinutes, format: (s) => formatDuration(s.chairMinutes), numeric: true, unit: 'minutes' },
    { id: 'sittings', header: 'Sittings', value: (s) => s.sittings, numeric: true },
    ...(currency
      ? [
          {
            id: 'revenue',
            header: 'Revenue',
            value: (s: ServiceRow) => minorToUnits(s.revenueCents ?? 0, currency),
            format: (s: ServiceRow) => formatMoney(s.revenueCents ?? 0, currency),
            numeric: true,
            unit: currency,
          },
        ]
      : []),
  ];
  return (
    <SectionCard title="Top services by chair time">
      <FigureTable caption="Services by chair time" columns={columns} rows={services} filename={filename} />
    </SectionCard>
  );
}
