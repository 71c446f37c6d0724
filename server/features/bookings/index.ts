// The bookings feature's public module: other features import it only from here.
export { bookAt } from './book-at.service';
export { auditBookingChange } from './booking-audit.service';
export { bookingSnapshot } from './booking-snapshot.repository';
export { deskBookingView } from './booking-view.service';
export { loadBookingViews } from './booking-views.service';
export { depositMoneyOf } from './booking-views.repository';
export { tstzRange } from './bookings.repository';
export { cancelBooking, cancelOutcome, depositOutcome } from './cancel-booking.service';
export { changeSittingChair, changeStepBasin } from './change-unit.service';
export { confirmHeld, sittingStarts } from './change-booking.repository';
export { localDayBounds, todayIn } from './day-view.service';
export { setDevelopingLength } from './developing-length.service';
export { oncePerKey } from './idempotent.service';
export { moveSitting, moveSittingIn } from './move-booking.service';
export { findStaffIdForUser, listBasins, listChairs, listStylists } from './salon-resources.repository';
