// The day-of-service feature's public module: other features import it only from here.
export { useSittingTap, type SittingTap } from './api/sitting-tap-mutations';
export { chime, unlockChime } from './alerts/chime';
export { showNotice } from './alerts/notices';
export { useTimerAlerts, type DueAlert } from './alerts/use-timer-alerts';
export { AlertsSwitch } from './components/alerts-switch';
export { UndoTapButton } from './components/undo-tap-button';
