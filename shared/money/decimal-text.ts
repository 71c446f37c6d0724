const TYPED = /^([+-]?)(\d*)(?:\.(\d*))?$/;

/**
 * A typed decimal ("260", "260.5", ".75", "1,234.50") as a whole number of its `digits`-place unit
 * ("8.25" with 3 digits is 8250), or null when it is not a number. Commas are read as thousands separators
 * only in groups of three, so "1,5" is refused rather than guessed; digits beyond `digits` round half away
 * from zero, on the typed digits rather than on a binary fraction.
 */
export function parseDecimal(text: string, digits: number): number | null {
  const trimmed = text.trim();
  const plain = /^[+-]?\d{1,3}(,\d{3})+(\.\d*)?$/.test(trimmed) ? trimmed.replace(/,/g, '') : trimmed;
  const match = TYPED.exec(plain);
  if (!match || (match[2] === '' && (match[3] ?? '') === '')) return null;
  const fraction = match[3] ?? '';
  const kept = Number(`${match[2] || '0'}${fraction.slice(0, digits).padEnd(digits, '0')}`);
  const value = kept + (fraction.charAt(digits) >= '5' ? 1 : 0);
  return match[1] === '-' && value !== 0 ? -value : value;
}
