/**
 * CSV export: quoting per RFC 4180 (fields with commas, quotes or line breaks are quoted, quotes doubled)
 * and OWASP's CSV-injection rule (cells starting with = + - @ tab or CR get a leading single quote).
 */
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { toCsv } from './csv';

describe('toCsv', () => {
  it('neutralises every formula-starting character named by OWASP', () => {
    const cells = ['=SUM(A1:A2)', '+1+1', '-2+3', '@cmd', '\tTAB', '\rCR', '=HYPERLINK("http://x")\nsecond line'];
    const text = toCsv(
      ['name'],
      cells.map((c) => [c]),
    );
    const parsed = Papa.parse<string[]>(text, { newline: '\r\n' }).data.slice(1, 1 + cells.length);
    // Each read back starts with the quote, then the original text.
    expect(parsed.map((r) => r[0])).toEqual(cells.map((c) => `'${c}`));
  });

  it('leaves ordinary text and numbers alone (negative numbers stay numbers)', () => {
    const text = toCsv(
      ['stylist', 'share', 'change'],
      [
        ['Ana Moreno', 0.42, -3],
        ['Lee, Tanaka', null, 0],
        ['Say "hi"', 1, 2],
      ],
    );
    expect(text).toBe('stylist,share,change\r\nAna Moreno,0.42,-3\r\n"Lee, Tanaka",,0\r\n"Say ""hi""",1,2');
  });
});
