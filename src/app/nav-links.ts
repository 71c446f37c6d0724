import type { Role } from '../../shared/schemas/common.schemas';
import { paths } from '../config/paths';

/** The header's links for each role: its home first, then the pages it uses often. */
export const navLinks: Record<Role, { to: string; label: string }[]> = {
  owner: [
    { to: paths.owner, label: 'Overview' },
    { to: paths.desk(), label: 'Book' },
    { to: paths.outbox, label: 'Outbox (demo)' },
  ],
  front_desk: [
    { to: paths.desk(), label: 'Book' },
    { to: paths.outbox, label: 'Outbox (demo)' },
  ],
  stylist: [{ to: paths.stylist(), label: 'My day' }],
  client: [{ to: paths.me, label: 'My bookings' }],
};
