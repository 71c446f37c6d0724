import { describe, expect, it } from 'vitest';
import { ApiError, problemText } from './api-error';

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
