import type { ClientMessage } from '../messages';

/** The deposit request the desk sends: what it is for, how much, the link, and when an unpaid booking is released. */
export function depositRequestMessage(r: {
  salonId: string;
  salonName: string;
  clientId: string;
  clientName: string;
  requestId: string;
  channel: 'sms' | 'email';
  serviceName: string;
  stylistName: string;
  when: string;
  amount: string;
  releasedAt: string | null;
  link: string;
}): ClientMessage {
  const first = r.clientName.split(/\s+/)[0] || 'there';
  const release = r.releasedAt ? ` If it is not paid by ${r.releasedAt}, the booking is released.` : '';
  return {
    salonId: r.salonId,
    clientId: r.clientId,
    kind: 'deposit_request',
    key: `deposit-request:${r.requestId}`,
    channels: [r.channel],
    subject: `${r.salonName}: the deposit for your ${r.serviceName}`,
    email:
      `Hello ${first},\n\nTo secure your ${r.serviceName} with ${r.stylistName} on ${r.when} (salon time), please pay the ${r.amount} deposit here:\n` +
      `${r.link}\n\nYou pay on our payment service's own secure page.${release}\n`,
    sms: `${r.salonName}: please pay the ${r.amount} deposit for your ${r.serviceName} on ${r.when}: ${r.link}${release}`,
  };
}
