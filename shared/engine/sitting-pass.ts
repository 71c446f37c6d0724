/**
 * The backward pass over one sitting's chain of steps.
 *
 * Start sets are kept as "lattices": flat arrays [p0, q0, p1, q1, ...] of closed ranges whose ends
 * are grid points (t ≡ phase mod g); a range stands for every grid point inside it. Step k may run
 * inside any one interval of its free set and last any grid multiple in [lo, hi]; G(k) is the set
 * of grid starts t for which such a run ends at a point of G(k+1). With the intervals sorted this
 * is one two-pointer sweep per step, and G(1) is exactly the set of feasible starts.
 */
import { firstEndingAfter, SHIFT, sortSlots, type Span } from './intervals';

export type Lattice = number[];

export interface ChainStep {
  /** One or more sorted free sets; the step must fit inside one interval of one of them. */
  free: Span[];
  lo: number;
  hi: number;
}

export interface Grid {
  g: number;
  phase: number;
}

const mod = (a: number, m: number): number => ((a % m) + m) % m;
export const ceilGrid = (x: number, grid: Grid): number => x + mod(grid.phase - x, grid.g);
export const floorGrid = (x: number, grid: Grid): number => x - mod(x - grid.phase, grid.g);

function pushRange(out: Lattice, x: number, y: number, g: number): void {
  if (x > y) return;
  const last = out.length - 1;
  // Non-null assertions in this file: lattices have even length and each index is inside its loop bound.
  if (last > 0 && x <= out[last]! + g) {
    if (y > out[last]!) out[last] = y;
  } else {
    out.push(x, y);
  }
}

/** Starts of one step inside `span` whose end lands in `next` (null: anywhere). */
function stepBack(span: Span, next: Lattice | null, lo: number, hi: number, grid: Grid): Lattice {
  const out: Lattice = [];
  let j = 0;
  for (let i = 0; i < span.length; i += 2) {
    const a = ceilGrid(span[i]!, grid);
    const bl = floorGrid(span[i + 1]!, grid);
    if (next === null) {
      pushRange(out, a, bl - lo, grid.g);
      continue;
    }
    while (j < next.length && next[j + 1]! < a + lo) j += 2;
    for (let k = j; k < next.length && next[k]! <= bl; k += 2) {
      const nq = next[k + 1]!;
      const q = nq < bl ? nq : bl;
      const p = next[k]! - hi;
      pushRange(out, p > a ? p : a, q - lo, grid.g);
    }
  }
  return out;
}

// A range packs into one sort key p * 2^26 + (q - p), as in intervals.ts: no tuples to sort.

/** Union of several lattices (basin steps have one per basin; a day has one per chair). */
export function mergeLattices(parts: Lattice[], g: number): Lattice {
  let count = 0;
  let only: Lattice = [];
  for (const part of parts) {
    if (part.length === 0) continue;
    count += part.length / 2;
    only = part;
  }
  if (count === only.length / 2) return only;
  const keys = sortSlots(count);
  let n = 0;
  for (const part of parts) {
    for (let i = 0; i < part.length; i += 2) {
      const p = part[i]!;
      keys[n++] = p * SHIFT + (part[i + 1]! - p);
    }
  }
  keys.sort();
  const out: Lattice = [];
  for (let i = 0; i < n; i++) {
    const key = keys[i]!;
    const p = Math.floor(key / SHIFT);
    pushRange(out, p, p + (key - p * SHIFT), g);
  }
  return out;
}

/**
 * Grid points in both lattices (same grid, so the cut ends are grid points too). The sweep of `intersect` in
 * intervals.ts, for closed ranges: ranges that meet at one point keep it.
 */
export function intersectLattices(a: Lattice, b: Lattice): Lattice {
  const out: Lattice = [];
  let i = 0;
  let j = 0;
  while (i < a.length && j < b.length) {
    const as = a[i]!;
    const ae = a[i + 1]!;
    const bs = b[j]!;
    const be = b[j + 1]!;
    const lo = as > bs ? as : bs;
    const hi = ae < be ? ae : be;
    if (lo <= hi) out.push(lo, hi);
    if (ae < be) i += 2;
    else j += 2;
  }
  return out;
}

/**
 * G(k) for every step, from last to first; result[k] is the set of feasible starts of step k.
 * Stops early (returning shorter arrays filled with []) once a set is empty.
 */
export function backwardPass(steps: ChainStep[], grid: Grid): Lattice[] {
  const sets: Lattice[] = steps.map(() => []);
  let next: Lattice | null = null;
  for (let k = steps.length - 1; k >= 0; k--) {
    const { free, lo, hi } = steps[k]!;
    next =
      free.length === 1
        ? stepBack(free[0]!, next, lo, hi, grid)
        : mergeLattices(
            free.map((span) => stepBack(span, next, lo, hi, grid)),
            grid.g,
          );
    sets[k] = next;
    if (next.length === 0) break;
  }
  return sets;
}

/** Whether grid point t lies in the lattice. */
export function latticeHas(l: Lattice, t: number): boolean {
  // Closed ranges: the first range ending at or after t is the first ending above t - 1.
  const i = firstEndingAfter(l, t - 1);
  return i < l.length && l[i]! <= t;
}
