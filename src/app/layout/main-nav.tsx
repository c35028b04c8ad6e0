import { NavLink } from 'react-router-dom';
import type { Role } from '@shared/schemas/roles';
import { cn } from '@/lib/cn';
import { navItemsFor } from '../access';

export function MainNav({ role }: { role: Role }) {
  return (
    <nav aria-label="Main" className="mx-auto max-w-5xl px-2 sm:px-4">
      <ul className="flex gap-1">
        {navItemsFor(role).map((item) => (
          <li key={item.to}>
            <NavLink
              to={item.to}
              className={({ isActive }) =>
                cn(
                  'inline-flex min-h-touch items-center border-b-4 px-4 text-lg font-semibold',
                  'focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-inset focus-visible:ring-accent',
                  isActive ? 'border-accent text-accent-strong' : 'border-transparent text-ink-muted hover:text-ink',
                )
              }
            >
              {item.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
