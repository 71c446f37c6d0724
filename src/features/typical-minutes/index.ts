// The typical-minutes feature's public module: other features import it only from here.
export { useTypicalMinutes } from './api/typical-minutes-queries';
export { typicalMinutesNotes } from './components/typical-minutes-notes';
