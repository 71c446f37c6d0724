import { QueryClient } from '@tanstack/react-query';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { startLiveBook } from './live-book';

/** A stand-in for the browser's EventSource: the test opens, fails and messages it by hand. */
class FakeEventSource {
  static readonly CONNECTING = 0;
  static readonly OPEN = 1;
  static readonly CLOSED = 2;
  static made: FakeEventSource[] = [];
  readyState = FakeEventSource.CONNECTING;
  private listeners = new Map<string, ((event: unknown) => void)[]>();
  constructor(readonly url: string) {
    FakeEventSource.made.push(this);
  }
  addEventListener(type: string, listener: (event: unknown) => void) {
    this.listeners.set(type, [...(this.listeners.get(type) ?? []), listener]);
  }
  close() {
    this.readyState = FakeEventSource.CLOSED;
  }
  emit(type: string, event: unknown = {}) {
    if (type === 'open') this.readyState = FakeEventSource.OPEN;
    for (const listener of this.listeners.get(type) ?? []) listener(event);
  }
}

/** How many times the cache was told the book changed (each change refreshes several endpoints at once). */
function refreshCounter(queryClient: QueryClient) {
  const spy = vi.spyOn(queryClient, 'invalidateQueries');
  return () => spy.mock.calls.length;
}

describe('live updates of the book', () => {
  beforeEach(() => {
    vi.useFakeTimers();
    FakeEventSource.made = [];
    vi.stubGlobal('EventSource', FakeEventSource);
    vi.stubGlobal('window', globalThis);
  });
  afterEach(() => {
    vi.useRealTimers();
    vi.unstubAllGlobals();
  });

  it('reads the book again when the stream first opens, since a change made while the page loaded was heard by nobody', () => {
    const queryClient = new QueryClient();
    const refreshes = refreshCounter(queryClient);
    const stop = startLiveBook(queryClient, () => undefined);
    const stream = FakeEventSource.made[0]!;
    expect(stream.url).toBe('/api/events');
    vi.advanceTimersByTime(1_000);
    expect(refreshes()).toBe(0); // nothing before the stream is heard
    stream.emit('open');
    vi.advanceTimersByTime(250);
    const afterFirstOpen = refreshes();
    expect(afterFirstOpen).toBeGreaterThan(0);
    // A browser's quiet reconnection (no error seen) reads nothing more.
    stream.emit('open');
    vi.advanceTimersByTime(250);
    expect(refreshes()).toBe(afterFirstOpen);
    stop();
  });

  it('says it is paused only after a lasting loss, and catches up once back', () => {
    const queryClient = new QueryClient();
    const refreshes = refreshCounter(queryClient);
    const paused: boolean[] = [];
    const stop = startLiveBook(queryClient, (p) => paused.push(p));
    const stream = FakeEventSource.made[0]!;
    stream.emit('open');
    vi.advanceTimersByTime(250);
    const before = refreshes();

    // A blip: back within a second, no banner, but the book is read again.
    stream.emit('error');
    vi.advanceTimersByTime(500);
    stream.emit('open');
    vi.advanceTimersByTime(2_000);
    expect(paused).not.toContain(true);
    paused.length = 0;
    expect(refreshes()).toBeGreaterThan(before);

    // A refused stream: the banner after 1.5 s, a new stream tried, and the banner gone when it opens.
    stream.emit('error');
    stream.close();
    stream.emit('error');
    vi.advanceTimersByTime(1_600);
    expect(paused).toEqual([true]);
    const retried = FakeEventSource.made.at(-1)!;
    expect(retried).not.toBe(stream);
    const beforeBack = refreshes();
    retried.emit('open');
    vi.advanceTimersByTime(250);
    expect(paused).toEqual([true, false]);
    expect(refreshes()).toBeGreaterThan(beforeBack);
    stop();
  });

  it('reads one burst of changes as one refresh', () => {
    const queryClient = new QueryClient();
    const stop = startLiveBook(queryClient, () => undefined);
    const stream = FakeEventSource.made[0]!;
    stream.emit('open');
    vi.advanceTimersByTime(250);
    const refreshes = refreshCounter(queryClient);
    const change = (date: string) => ({ data: JSON.stringify({ dates: [date], everyDate: false, bookingIds: [] }) });
    stream.emit('book', change('2027-03-02'));
    stream.emit('book', change('2027-03-03'));
    stream.emit('book', { data: 'not json' });
    expect(refreshes()).toBe(0);
    vi.advanceTimersByTime(250);
    const once = refreshes();
    expect(once).toBeGreaterThan(0);
    vi.advanceTimersByTime(1_000);
    expect(refreshes()).toBe(once);
    stop();
  });
});
