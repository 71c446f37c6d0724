/**
 * Sorted, half-open integer-minute interval sets.
 *
 * A `Span` is a flat array [s0, e0, s1, e1, ...] with s_i < e_i and e_i <= s_{i+1}.
 * Flat arrays keep the hot loops allocation-light (no tuple objects per interval).
 */
export type Span = number[];

// Minutes since 1970 stay below 2^26 until the 2090s, so a pair packs into one double as
// start * 2^26 + length and sorts with the typed-array numeric sort (no comparator callbacks).
export const SHIFT = 2 ** 26;

// One reusable buffer for those sort keys: a fresh typed array per call lives outside the JS
// heap and, across thousands of queries, grows the process far more than the data needs.
let scratch = new Float64Array(4096);

/** A view of n sort slots in the shared buffer; callers must be done with it before the next call. */
export function sortSlots(n: number): Float64Array {
  if (scratch.length < n) scratch = new Float64Array(Math.max(n, scratch.length * 2));
  return scratch.subarray(0, n);
}

/** Sorts and merges (overlapping or touching) raw [start, end) pairs into a Span. */
export function normalize(pairs: Span): Span {
  const keys = sortSlots(pairs.length / 2);
  let n = 0;
  let sorted = true;
  // Non-null assertions below: a Span has even length and every index stays inside its loop bound.
  for (let i = 0; i < pairs.length; i += 2) {
    const s = pairs[i]!;
    const e = pairs[i + 1]!;
    if (e <= s) continue;
    const key = s * SHIFT + Math.min(e - s, SHIFT - 1);
    keys[n] = key;
    if (n > 0 && key < keys[n - 1]!) sorted = false;
    n++;
  }
  const order = keys.subarray(0, n);
  if (!sorted) order.sort();
  const out: Span = [];
  for (let i = 0; i < n; i++) {
    const key = order[i]!;
    const s = Math.floor(key / SHIFT);
    const e = s + (key - s * SHIFT);
    const last = out.length - 1;
    if (last > 0 && s <= out[last]!) {
      if (e > out[last]!) out[last] = e;
    } else {
      out.push(s, e);
    }
  }
  return out;
}

/** a ∩ b. */
export function intersect(a: Span, b: Span): Span {
  const out: Span = [];
  let i = 0;
  let j = 0;
  while (i < a.length && j < b.length) {
    const as = a[i]!;
    const ae = a[i + 1]!;
    const bs = b[j]!;
    const be = b[j + 1]!;
    const s = as > bs ? as : bs;
    const e = ae < be ? ae : be;
    if (s < e) out.push(s, e);
    if (ae < be) i += 2;
    else j += 2;
  }
  return out;
}

/** a minus b. */
export function subtract(a: Span, b: Span): Span {
  const out: Span = [];
  let j = 0;
  for (let i = 0; i < a.length; i += 2) {
    let s = a[i]!;
    const e = a[i + 1]!;
    while (j < b.length && b[j + 1]! <= s) j += 2;
    let k = j;
    while (k < b.length && b[k]! < e) {
      const bs = b[k]!;
      const be = b[k + 1]!;
      if (bs > s) out.push(s, bs);
      if (be > s) s = be;
      if (s >= e) break;
      k += 2;
    }
    if (s < e) out.push(s, e);
  }
  return out;
}

/** The part of `a` inside [lo, hi), found by binary search so day-sized slices stay cheap. */
export function clip(a: Span, lo: number, hi: number): Span {
  const out: Span = [];
  for (let i = firstEndingAfter(a, lo); i < a.length && a[i]! < hi; i += 2) {
    const s = a[i]!;
    const e = a[i + 1]!;
    out.push(s < lo ? lo : s, e > hi ? hi : e);
  }
  return out;
}

/** Total minutes covered. */
export function totalLength(a: Span): number {
  let sum = 0;
  for (let i = 0; i < a.length; i += 2) sum += a[i + 1]! - a[i]!;
  return sum;
}

/** Index (even) of the interval holding minute t, or -1. */
export function findContaining(a: Span, t: number): number {
  const i = firstEndingAfter(a, t);
  return i < a.length && a[i]! <= t ? i : -1;
}

/**
 * Even index of the first pair whose end is above t (a.length if none), by binary search.
 * Works for half-open Spans and, with t - 1, for the closed ranges of a lattice.
 */
export function firstEndingAfter(a: number[], t: number): number {
  let left = 0;
  let right = a.length / 2;
  while (left < right) {
    const mid = (left + right) >> 1;
    if (a[2 * mid + 1]! <= t) left = mid + 1;
    else right = mid;
  }
  return 2 * left;
}

/** Minutes where at least `k` of the given raw [start, end) pairs overlap. */
export function coverageAtLeast(pairs: Span, k: number): Span {
  const events = sortSlots(pairs.length).fill(0);
  for (let i = 0; i < pairs.length; i += 2) {
    const s = pairs[i]!;
    const e = pairs[i + 1]!;
    if (e <= s) continue;
    // Ends sort before starts at the same minute: half-open intervals that touch do not overlap.
    events[i] = s * 2 + 1;
    events[i + 1] = e * 2;
  }
  events.sort();
  const out: Span = [];
  let depth = 0;
  for (const ev of events) {
    if (ev === 0) continue; // slot of a skipped empty pair
    const t = Math.floor(ev / 2);
    const before = depth;
    depth += ev % 2 === 1 ? 1 : -1;
    if (before < k && depth >= k) out.push(t);
    else if (before >= k && depth < k) out.push(t);
  }
  return normalize(out);
}
