import { unlockChime } from './chime';

/** Browser notices (the Notification API) for developing alerts; asked for once, after a click, never on load. */
const ASKED_KEY = 'dwell.developing-alerts.asked';

export const noticesSupported = (): boolean => typeof window !== 'undefined' && 'Notification' in window;

export function noticePermission(): NotificationPermission | 'unsupported' {
  return noticesSupported() ? Notification.permission : 'unsupported';
}

export const alreadyAsked = (): boolean => window.localStorage.getItem(ASKED_KEY) === '1';

/** Called from the button's click: the browser shows its own question once; the answer is kept by the browser. */
export async function askForNotices(): Promise<NotificationPermission | 'unsupported'> {
  window.localStorage.setItem(ASKED_KEY, '1');
  unlockChime();
  if (!noticesSupported()) return 'unsupported';
  return Notification.permission === 'default' ? Notification.requestPermission() : Notification.permission;
}

export function showNotice(title: string, body: string, tag: string): void {
  if (noticePermission() !== 'granted') return;
  try {
    new Notification(title, { body, tag });
  } catch {
    // Some mobile browsers only show notices from a service worker; the chime and the timer's words still say it.
  }
}
