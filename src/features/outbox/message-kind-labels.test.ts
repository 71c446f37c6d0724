import { describe, expect, it } from 'vitest';
import { messageKindLabel } from './message-kind-labels';

describe('the send log names each kind of message in words', () => {
  it('reads reminders with their hours and the other kinds by name, never the stored code', () => {
    expect(messageKindLabel('reminder_48h')).toBe('Reminder, 48 hours before');
    expect(messageKindLabel('day_before_sitting')).toBe('Day before a sitting');
    expect(messageKindLabel('desk_no_deposit_list')).toBe('Desk list: bookings without a deposit');
    expect(messageKindLabel('receipt')).toBe('Receipt');
    expect(messageKindLabel('something_new')).toBe('Something new');
  });
});
