// The replan feature's public module: other features import it only from here.
export { RunningLatePanel } from './components/running-late-panel';
export { TapReplanNote } from './components/tap-replan-note';
export { useDayRun } from './api/use-day-run';
