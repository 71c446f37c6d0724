import { parseDecimal } from './decimal-text';

/*
 * Rates and shares (the salon's tax rate, a percent discount) are whole thousandths of a percent, so a rate
 * with up to three decimals is an exact integer: 8.25 % is 8250, 100 % is PERCENT_SCALE.
 */

/** 100 % in thousandths of a percent. */
export const PERCENT_SCALE = 100_000;

/** A rate as a person reads and types it, without the sign and without trailing zeros: 8250 → "8.25", 0 → "0". */
export function percentText(milliPercent: number): string {
  return (milliPercent / 1000).toFixed(3).replace(/\.?0+$/, '');
}

/** A typed percentage ("8.25", "20", "7.125") in thousandths of a percent, or null when it is not a number. */
export function parsePercent(text: string): number | null {
  return parseDecimal(text, 3);
}
