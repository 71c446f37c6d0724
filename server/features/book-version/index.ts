// The book version feature's public module: other features import it only from here.
export { daysFrom, salonAtBookVersion, type DayRange } from './book-version.repository';
export { cachedBookRead } from './cached-book-read';
