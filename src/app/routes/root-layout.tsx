import { NavLink, Outlet, useNavigation } from 'react-router';
import { paths } from '@/config/paths';

interface NavItem {
  to: string;
  label: string;
}

/** Only screens that exist are listed; later features add theirs here. */
const NAV_ITEMS: NavItem[] = [{ to: paths.home.href(), label: 'Overview' }];

export function RootLayout() {
  const navigation = useNavigation();
  return (
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-4 focus:top-4 focus:z-50 focus:rounded-md focus:bg-panel focus:px-4 focus:py-2">
        Skip to content
      </a>
      <header className="border-b border-line bg-panel">
        <div className="mx-auto flex max-w-7xl items-center gap-6 px-4 sm:px-6">
          <NavLink to={paths.home.href()} className="flex min-h-touch items-center gap-2 py-3 text-lg font-semibold tracking-tight">
            <img src="/favicon.svg" alt="" className="h-7 w-7" />
            Knitwright
          </NavLink>
          <nav aria-label="Main" className="flex flex-1 items-center gap-1 overflow-x-auto">
            {NAV_ITEMS.map((item) => (
              <NavLink
                key={item.to}
                to={item.to}
                end
                className={({ isActive }) =>
                  `flex min-h-touch items-center rounded-lg px-3 text-sm font-medium ${
                    isActive ? 'bg-accent-soft text-accent-strong' : 'text-muted hover:bg-surface hover:text-ink'
                  }`
                }
              >
                {item.label}
              </NavLink>
            ))}
          </nav>
        </div>
      </header>
      {navigation.state === 'loading' && <div className="h-0.5 animate-pulse bg-accent" role="progressbar" aria-label="Loading" />}
      <main id="main" className="mx-auto w-full max-w-7xl flex-1 px-4 py-6 sm:px-6">
        <Outlet />
      </main>
    </div>
  );
}
