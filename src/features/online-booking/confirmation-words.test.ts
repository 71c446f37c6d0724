import { Settings } from 'luxon';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { confirmationWords } from './confirmation-words';

const base = { timeZone: 'America/Denver', quietHours: { from: '21:00', to: '08:00' } };

beforeAll(() => {
  Settings.defaultLocale = 'en-US';
});
afterAll(() => {
  Settings.defaultLocale = '';
});

describe('confirmationWords', () => {
  it('says a text held back by quiet hours goes when they end, in salon time, and does not call it sent', () => {
    // 2027-03-03T15:00Z is 08:00 in Denver (UTC−7 in winter, IANA tz database): the end of quiet hours that morning.
    const words = confirmationWords({
      ...base,
      sends: [
        { channel: 'email', status: 'sent', sendAt: '2027-03-03T05:10:00Z', sentAt: '2027-03-03T05:10:01Z' },
        { channel: 'sms', status: 'waiting', sendAt: '2027-03-03T15:00:00Z', sentAt: null },
      ],
    });
    expect(words).toEqual([
      'We sent a confirmation by e-mail.',
      'The confirmation text goes at 8:00 AM on Wed 3 Mar 2027 (salon time): the salon sends no texts between 9:00 PM and 8:00 AM.',
    ]);
  });

  it('names every channel that went, and only those the client has', () => {
    const sent = { status: 'sent' as const, sendAt: '2027-03-03T17:00:00Z', sentAt: '2027-03-03T17:00:01Z' };
    expect(
      confirmationWords({
        ...base,
        sends: [
          { channel: 'email', ...sent },
          { channel: 'sms', ...sent },
        ],
      }),
    ).toEqual(['We sent a confirmation by e-mail and text.']);
    expect(confirmationWords({ ...base, sends: [{ channel: 'email', ...sent }] })).toEqual(['We sent a confirmation by e-mail.']);
  });

  it('tells what is still on its way or failed, and when nothing is sent at all', () => {
    const at = { sendAt: '2027-03-03T17:00:00Z', sentAt: null };
    expect(
      confirmationWords({
        ...base,
        sends: [
          { channel: 'email', status: 'sending', ...at },
          { channel: 'sms', status: 'failed', ...at },
        ],
      }),
    ).toEqual(['The confirmation e-mail is on its way.', 'The confirmation text could not be sent; your booking is in My bookings.']);
    expect(confirmationWords({ ...base, sends: [] })[0]).toMatch(/^No confirmation message is sent/);
  });
});
