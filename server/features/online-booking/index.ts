// The online booking feature's public module: other features import it only from here.
export { freeTimes } from './availability.service';
export { bookingIcs } from './booking-ics';
