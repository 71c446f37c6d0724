import type { Role } from '@shared/schemas/common.schemas';
import { paths } from '../config/paths';

// The desk's pages, shared by the front desk and the owner.
const deskLinks = [
  { to: paths.desk(), label: 'Book' },
  { to: paths.deskWeek(), label: 'Week' },
  { to: paths.deskBook(), label: 'Book a service' },
  { to: paths.deskStandby, label: 'Standby' },
  { to: paths.deskTakings(), label: 'Takings' },
  { to: paths.outbox, label: 'Outbox (demo)' },
];

/** The header's links for each role: its home first, then the pages it uses often. */
export const navLinks: Record<Role, { to: string; label: string }[]> = {
  owner: [
    { to: paths.owner, label: 'Overview' },
    { to: paths.ownerUtilisation, label: 'Utilisation' },
    { to: paths.ownerSetup, label: 'Set-up' },
    ...deskLinks,
  ],
  front_desk: [...deskLinks, { to: paths.deskUtilisation, label: 'Chair use' }],
  stylist: [{ to: paths.stylist(), label: 'My day' }],
  client: [
    { to: paths.me, label: 'My bookings' },
    { to: paths.myHair, label: 'Hair history and photos' },
  ],
};
