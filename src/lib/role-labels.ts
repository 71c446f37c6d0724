import type { Role } from '@shared/schemas/common.schemas';

/** A role in words. Apart from the booking labels: the app frame shows it on every page's first load. */
export const roleLabels: Record<Role, string> = {
  client: 'client',
  front_desk: 'front desk',
  stylist: 'stylist',
  owner: 'owner',
};
