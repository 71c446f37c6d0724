/** What each kind of message in the send log is, in words (the log keeps the kind's code). */
const KIND_LABELS: Record<string, string> = {
  confirmation: 'Confirmation',
  change: 'Change notice',
  cancellation: 'Cancellation notice',
  day_before_sitting: 'Day before a sitting',
  aftercare: 'Aftercare',
  follow_up: 'Follow-up suggestion',
  skin_test: 'Skin test',
  skin_test_booked: 'Skin test booked',
  quote: 'Quote',
  window_offer: 'Window offer',
  window_offer_taken: 'Window offer taken',
  window_offer_gone: 'Window offer withdrawn',
  stylist_day_list: "Stylist's list for the day",
  desk_no_deposit_list: 'Desk list: bookings without a deposit',
  receipt: 'Receipt',
};

/** "Reminder, 48 hours before" for `reminder_48h`; a kind with no words yet reads as its code with spaces. */
export function messageKindLabel(kind: string): string {
  const reminder = /^reminder_(\d+)h$/.exec(kind);
  if (reminder) return `Reminder, ${reminder[1]} hours before`;
  const label = KIND_LABELS[kind] ?? kind.replace(/_/g, ' ');
  return label.charAt(0).toUpperCase() + label.slice(1);
}
