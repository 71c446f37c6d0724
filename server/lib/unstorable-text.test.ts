import { describe, expect, it } from 'vitest';
import { unstorablePaths } from './unstorable-text';

const unstorablePath = (v: unknown) => unstorablePaths(v)[0] ?? null;

// PostgreSQL: "text" cannot contain the NUL character (documentation, Character Types); a lone UTF-16 surrogate has
// no UTF-8 encoding (Unicode Standard, §3.9: surrogate code points are not scalar values).
describe('unstorablePath', () => {
  it('finds a NUL byte or a lone surrogate anywhere in a body, naming the field', () => {
    expect(unstorablePath({ name: 'a\u0000b' })).toBe('name');
    expect(unstorablePath({ hours: [{ rrule: 'x' }, { rrule: 'a\ud800b' }] })).toBe('hours.1.rrule');
    expect(unstorablePath({ note: 'tail \udc00' })).toBe('note');
    expect(unstorablePath('\u0000')).toBe('body');
    expect(unstorablePaths({ a: '\u0000', b: 'ok', c: ['\ud800'] })).toEqual(['a', 'c.0']);
  });

  it('lets whole emoji (surrogate pairs) and ordinary text through', () => {
    expect(unstorablePath({ name: 'Ana 💇‍♀️ Moreno', list: ['ß', 'ç', '日本'] })).toBeNull();
    expect(unstorablePath({ n: 1, b: true, x: null })).toBeNull();
  });
});
