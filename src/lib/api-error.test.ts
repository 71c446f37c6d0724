import { describe, expect, it } from 'vitest';
import { ApiError, errorBodyOf, problemText } from './api-error';

describe('problemText', () => {
  it('gives the fields’ own messages for a 400 on fields, not the general "Some fields need attention."', () => {
    const error = new ApiError(400, 'VALIDATION_FAILED', 'Some fields need attention.', { start: 'That time has already passed.' });
    expect(problemText(error)).toBe('That time has already passed.');
  });

  it('gives the server’s message for a refusal without fields (a 409 with the engine’s reason)', () => {
    const error = new ApiError(409, 'CONFLICT', 'No chair (or basin, for the rinse) is free for the whole sitting at that time.');
    expect(problemText(error)).toBe('No chair (or basin, for the rinse) is free for the whole sitting at that time.');
  });
});

describe('errorBodyOf', () => {
  it('reads the API error shape as ApiErrorBodySchema describes it, fields and request id included', () => {
    const body = { error: { code: 'VALIDATION_FAILED', message: 'Some fields need attention.', fields: { start: 'Too early.' }, requestId: 'r1' } };
    expect(errorBodyOf(body)).toEqual(body.error);
    expect(errorBodyOf({ error: { code: 'NOT_FOUND', message: 'Not found.' } })).toEqual({ code: 'NOT_FOUND', message: 'Not found.' });
  });

  it('answers null for anything else: an unknown code, a missing message, a field that is not text, no body', () => {
    expect(errorBodyOf({ error: { code: 'TEAPOT', message: 'No.' } })).toBeNull();
    expect(errorBodyOf({ error: { code: 'CONFLICT' } })).toBeNull();
    expect(errorBodyOf({ error: { code: 'CONFLICT', message: 'Taken.', fields: { start: 3 } } })).toBeNull();
    expect(errorBodyOf({ error: { code: 'CONFLICT', message: 'Taken.', requestId: 7 } })).toBeNull();
    expect(errorBodyOf(null)).toBeNull();
    expect(errorBodyOf('<html>')).toBeNull();
  });
});
