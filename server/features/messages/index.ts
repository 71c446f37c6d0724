// The messages feature's public module: other features import it only from here.
export { planClientMessage, sendClientMessage, type ClientMessage } from './client-message.service';
export { firstMessageSends, salonQuietHours } from './messages.repository';
export { replanAfterSkinTestChange, replanBookingMessages, replanClientMessages } from './plan-messages.service';
export { sendLog } from './send-log.service';
export { sendDueMessages, sendOnTime, type Senders } from './send-message.job';
export { sendDueNow } from './send-now';
export { runningLateTold } from './running-late.repository';
export { tellRunningLate, type RunningLate, type RunningLateOutcome } from './running-late.service';
