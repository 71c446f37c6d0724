import { NavLink } from 'react-router-dom';
import { paths } from '@client/config/paths';

const links = [
  { to: paths.ownerSetup, label: 'Salon and hours', end: true },
  { to: paths.ownerSetupStaff, label: 'Staff', end: true },
  { to: paths.ownerSetupUnits, label: 'Chairs and basins', end: true },
  { to: paths.ownerSetupServices, label: 'Services and step plans', end: false },
  { to: paths.ownerQuotePrices, label: 'Quote prices', end: true },
  { to: paths.ownerSetupProducts, label: 'Products', end: true },
  { to: paths.ownerFollowUps, label: 'Follow-up rules', end: true },
];

/** The set-up pages' own small navigation, under the page title. */
export function SetupNav() {
  return (
    <nav aria-label="Set-up" className="mb-6 border-b border-ink/15">
      <ul className="flex flex-wrap gap-1">
        {links.map((link) => (
          <li key={link.to}>
            <NavLink
              to={link.to}
              end={link.end}
              className="inline-flex min-h-11 items-center rounded-t-lg px-3 font-bold hover:bg-linen aria-[current=page]:bg-white aria-[current=page]:ring-1 aria-[current=page]:ring-ink/15"
            >
              {link.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
