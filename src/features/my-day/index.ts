// The my-day feature's public module: other features import it only from here.
export { DevelopingTimer } from './components/developing-timer';
export { developingTiming, sittingProgress } from './timer-state';
