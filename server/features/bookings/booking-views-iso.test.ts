/**
 * The desk calendar's fast ISO 8601 printer must write exactly what luxon (reading the IANA tz database
 * through Intl) writes with toISO({ suppressMilliseconds: true }), including across the 2026 daylight-saving
 * changes: tz `northamerica` "Rule US 2007 max Mar Sun>=8 2:00 / Nov Sun>=1 2:00" (Denver 2026-03-08 and
 * 2026-11-01) and `europe` "Rule EU lastSun 1:00u" (London 2026-03-29 and 2026-10-25).
 */
import { describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { isoInZone } from './booking-views.repository';

const reference = (d: Date, zone: string) => DateTime.fromJSDate(d, { zone }).toISO({ suppressMilliseconds: true });

describe('isoInZone', () => {
  const cases: Array<[string, string]> = [
    ['America/Denver', '2026-03-07T00:00:00Z'],
    ['America/Denver', '2026-10-31T00:00:00Z'],
    ['Europe/London', '2026-03-28T00:00:00Z'],
    ['Europe/London', '2026-10-24T00:00:00Z'],
    ['Asia/Kolkata', '2026-06-01T00:00:00Z'],
  ];
  it.each(cases)('matches luxon in %s every 7 minutes over three days from %s', (zone, start) => {
    const from = new Date(start);
    const to = new Date(from.getTime() + 86_400_000);
    const iso = isoInZone(zone, { from, to });
    for (let ms = from.getTime() - 86_400_000; ms < from.getTime() + 2 * 86_400_000; ms += 7 * 60_000 + 13_000) {
      expect(iso(new Date(ms))).toBe(reference(new Date(ms), zone));
    }
  });

  it('matches luxon far outside the window, with milliseconds, and in UTC', () => {
    const from = new Date('2026-12-01T00:00:00Z');
    const iso = isoInZone('America/Denver', { from, to: new Date('2026-12-08T00:00:00Z') });
    for (const text of ['2027-07-04T15:30:00Z', '2026-12-02T10:00:00.250Z', '2025-01-01T00:00:05Z']) {
      expect(iso(new Date(text))).toBe(reference(new Date(text), 'America/Denver'));
    }
    const utc = isoInZone('UTC', { from, to: from });
    expect(utc(new Date('2026-12-02T10:00:00Z'))).toBe(reference(new Date('2026-12-02T10:00:00Z'), 'UTC'));
  });
});
