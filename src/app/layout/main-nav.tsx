import { Link, useLocation } from 'react-router-dom';
import type { Role } from '@shared/schemas/roles';
import { cn } from '@/lib/cn';
import { navItemsFor, type NavItem } from '../access';

const under = (pathname: string, to: string) => pathname === to || pathname.startsWith(`${to}/`);

/** The item the page belongs to: the longest matching address wins, so /visits/all is not also "My visits". */
function activeItem(items: readonly NavItem[], pathname: string): string | undefined {
  return items
    .filter((item) => under(pathname, item.to))
    .sort((a, b) => b.to.length - a.to.length)[0]?.to;
}

export function MainNav({ role }: { role: Role }) {
  const { pathname } = useLocation();
  const items = navItemsFor(role);
  const active = activeItem(items, pathname);
  return (
    <nav aria-label="Main" className="mx-auto max-w-5xl px-2 sm:px-4">
      <ul className="flex flex-wrap gap-x-1">
        {items.map((item) => (
          <li key={item.to}>
            <Link
              to={item.to}
              aria-current={item.to === active ? 'page' : undefined}
              className={cn(
                'inline-flex min-h-touch items-center border-b-4 px-4 text-lg font-semibold',
                'focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-inset focus-visible:ring-accent',
                item.to === active ? 'border-accent text-accent-strong' : 'border-transparent text-ink-muted hover:text-ink',
              )}
            >
              {item.label}
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}
