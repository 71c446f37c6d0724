/**
 * What a local fake does to its next requests, for tests and `npm run faults`: refuse them (the provider is
 * down), answer them late (the provider is slow), or hold them open without ever answering or keeping them
 * (the provider has not accepted yet). Each request takes one planned fault, refusals first.
 */
export interface FaultControls {
  /** The next `n` requests are refused as a provider outage would refuse them. */
  failNext(n: number): void;
  /** The next `n` requests are handled normally but answered `ms` later. */
  slowNext(n: number, ms: number): void;
}

export type Fault = { kind: 'fail' } | { kind: 'slow'; ms: number } | { kind: 'stall' } | null;

export class FaultPlan implements FaultControls {
  private failures = 0;
  private slow = 0;
  private slowMs = 0;
  private stalls = 0;

  failNext(n: number): void {
    this.failures = n;
  }

  slowNext(n: number, ms: number): void {
    this.slow = n;
    this.slowMs = ms;
  }

  stallNext(n: number): void {
    this.stalls = n;
  }

  /** The fault the next request meets, used up as it is taken. */
  take(): Fault {
    if (this.stalls > 0) return (this.stalls--, { kind: 'stall' });
    if (this.failures > 0) return (this.failures--, { kind: 'fail' });
    if (this.slow > 0) return (this.slow--, { kind: 'slow', ms: this.slowMs });
    return null;
  }
}

export const pause = (ms: number) => new Promise<void>((resolve) => setTimeout(resolve, ms));
