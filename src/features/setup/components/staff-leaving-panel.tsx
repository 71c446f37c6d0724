import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { AffectedBooking, StaffMember } from '@shared/schemas/setup.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { SelectField } from '@client/components/ui/select-field';
import { setupQueries } from '../api/setup-queries';
import { useDeactivateStaff, useReassign } from '../api/setup-mutations';
import { AffectedBookings } from './affected-bookings';

/** Re-assign one future booking to a stylist who is free for all of it. */
function ReassignControl({ member, booking }: { member: StaffMember; booking: AffectedBooking }) {
  const reassign = useReassign();
  const [to, setTo] = useState(booking.freeStylists[0]?.id ?? '');
  if (booking.freeStylists.length === 0) return <span className="text-sm">Nobody else is free for it: move or cancel it from the book.</span>;
  return (
    <div className="flex flex-wrap items-end gap-2">
      <SelectField
        label="Give to"
        aria-label={`Give the booking of ${booking.clientName} to`}
        options={booking.freeStylists.map((s) => ({ value: s.id, label: s.name }))}
        value={to}
        onChange={(e) => setTo(e.target.value)}
      />
      <Button variant="secondary" busy={reassign.isPending} onClick={() => reassign.mutate({ id: member.id, bookingId: booking.id, toStaffId: to })}>
        Re-assign
      </Button>
      {reassign.isError && <FormAlert>{reassign.error.message}</FormAlert>}
    </div>
  );
}

/** Deactivating someone: their future bookings first (to re-assign), then the account is switched off. */
export function StaffLeavingPanel({ member, timeZone, onDone }: { member: StaffMember; timeZone: string; onDone: (message: string) => void }) {
  const deactivate = useDeactivateStaff();
  const bookings = useQuery({ ...setupQueries.staffBookings(member.id), enabled: Boolean(member.staffId) });
  const left = bookings.data?.bookings ?? [];
  return (
    <div className="flex flex-col gap-3">
      {member.staffId &&
        (bookings.isPending ? (
          <p>Looking up future bookings…</p>
        ) : (
          <AffectedBookings
            bookings={left}
            timeZone={timeZone}
            label={`Future bookings of ${member.details.name}`}
            action={(b) => <ReassignControl member={member} booking={b} />}
          />
        ))}
      {deactivate.isError && <FormAlert>{deactivate.error.message}</FormAlert>}
      <div>
        <Button
          variant="secondary"
          disabled={left.length > 0}
          busy={deactivate.isPending}
          onClick={() => deactivate.mutate(member.id, { onSuccess: () => onDone(`${member.details.name} is deactivated and can no longer sign in.`) })}
        >
          Deactivate {member.details.name}
        </Button>
        {left.length > 0 && <p className="mt-1 text-sm">Re-assign, move or cancel every future booking first.</p>}
      </div>
    </div>
  );
}
