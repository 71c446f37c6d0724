import type { BookingOption, BookingOptionsResponse } from '@shared/schemas/booking.schemas';
import { SectionCard } from '@client/components/ui/section-card';
import { TimeZoneNote } from '@client/components/ui/time-zone-note';
import { OptionCard } from './option-card';

type Props = {
  answer: BookingOptionsResponse;
  bookingKey: string | null;
  onBook: (option: BookingOption) => void;
};

/** Identifies an option across re-asks (same stylist, same first start). */
export const optionKey = (option: BookingOption) => `${option.stylistId}@${option.sittings[0]?.start}`;

/** The engine's options side by side, to compare and book one. */
export function OptionList({ answer, bookingKey, onBook }: Props) {
  return (
    <SectionCard title="Options">
      <TimeZoneNote timeZone={answer.timeZone} />
      {answer.options.length === 0 ? (
        <p className="mt-3">
          {answer.skinTest.ok
            ? 'No free times were found. Try a later earliest date, another stylist, or a shorter step plan.'
            : 'No times can be offered until the skin test allows it.'}
        </p>
      ) : (
        <div className="mt-4 grid gap-4 sm:grid-cols-2 xl:grid-cols-3">
          {answer.options.map((option) => (
            <OptionCard
              key={optionKey(option)}
              option={option}
              timeZone={answer.timeZone}
              busy={bookingKey === optionKey(option)}
              disabled={bookingKey !== null}
              onBook={() => onBook(option)}
            />
          ))}
        </div>
      )}
    </SectionCard>
  );
}
