import type { ReactNode } from 'react';
import { Link, NavLink } from 'react-router-dom';
import type { NavItem } from '../../config/navigation';
import { paths } from '../../config/paths';
import { cn } from '../../utils/cn';
import { BrandName } from './brand-mark';
import { NavigationProgress } from './navigation-progress';

interface AppShellProps {
  navItems: NavItem[];
  userMenu: ReactNode;
  children: ReactNode;
}

/**
 * The frame around every signed-in page: a top bar with the name, the navigation the
 * person's role allows and their menu; then the page. Prints as the page alone.
 */
export function AppShell({ navItems, userMenu, children }: AppShellProps) {
  return (
    <div className="flex min-h-screen flex-col">
      <NavigationProgress />
      <a
        href="#main"
        className="no-print sr-only z-50 rounded-md bg-brand px-4 py-2 font-semibold text-white focus:not-sr-only focus:fixed focus:top-2 focus:left-2 focus:px-4 focus:py-2 focus:shadow-lg"
      >
        Skip to main content
      </a>
      <header className="no-print border-b border-slate-line bg-paper-raised">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-2 sm:px-6">
          <Link to={paths.home} className="rounded-md py-1" aria-label="QuietLayer home">
            <BrandName />
          </Link>
          {/* The navigation has its own row and wraps, so every entry stays visible on a plant-floor tablet. */}
          <nav aria-label="Main" className="order-3 -mx-1 w-full">
            <ul className="flex flex-wrap gap-1">
              {navItems.map((item) => (
                <li key={item.to}>
                  <NavLink
                    to={item.to}
                    end={item.to === paths.home}
                    className={({ isActive }) =>
                      cn(
                        'flex min-h-11 items-center rounded-md border-b-[3px] px-3 font-medium whitespace-nowrap',
                        isActive ? 'border-brand bg-brand-light/60 text-brand-dark' : 'border-transparent text-ink-soft hover:bg-paper-sunk hover:text-ink',
                      )
                    }
                  >
                    {item.label}
                  </NavLink>
                </li>
              ))}
            </ul>
          </nav>
          <div className="ml-auto">{userMenu}</div>
        </div>
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-7xl flex-1 px-4 py-6 outline-none sm:px-6">
        {children}
      </main>
      <footer className="no-print border-t border-slate-line px-4 py-3 text-center text-sm text-ink-soft">
        QuietLayer · will the layer stay quiet?
      </footer>
    </div>
  );
}
