import type { Role } from '@keybed/shared';
import { NavLink } from 'react-router-dom';
import { cx } from '@/lib/cx';
import { navItemsFor } from '../navigation';

/** Only what the member's role may use. On a phone it scrolls sideways rather than hiding items. */
export function MainNav({ role, className }: { role: Role; className?: string }) {
  return (
    <nav aria-label="Main" className={cx('-mx-4 overflow-x-auto px-4 lg:mx-0 lg:px-0', className)}>
      <ul className="flex gap-1">
        {navItemsFor(role).map((item) => (
          <li key={item.to}>
            <NavLink
              to={item.to}
              end={item.isExact}
              className={({ isActive }) =>
                cx(
                  'flex min-h-11 items-center border-b-4 px-3 font-semibold whitespace-nowrap',
                  isActive ? 'border-spruce text-white' : 'border-transparent text-graphite-200 hover:text-white',
                )
              }
            >
              {item.label}
              {item.Badge && <item.Badge />}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
