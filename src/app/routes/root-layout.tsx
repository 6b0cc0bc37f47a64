import { useRef } from 'react';
import { NavLink, Outlet, useNavigation } from 'react-router';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { HeaderAccount } from '@/features/auth/components/header-account';
import { isOwner } from '@/features/auth/hooks/use-member';
import { useRouteFocus } from '@/lib/use-route-focus';

interface NavItem {
  to: string;
  label: string;
  /** Owners only: a cutter never sees the entry (the server refuses them too). */
  ownerOnly?: boolean;
}

/** Only screens that exist are listed; later features add theirs here. */
const NAV_ITEMS: NavItem[] = [
  { to: paths.home.href(), label: 'Overview' },
  { to: paths.clients.href(), label: 'Clients' },
  { to: paths.fabrics.href(), label: 'Fabrics' },
  { to: paths.drafts.href(), label: 'Drafts' },
  { to: paths.queue.href(), label: 'Work queue' },
  { to: paths.studio.href(), label: 'Studio', ownerOnly: true },
];

export function RootLayout() {
  const navigation = useNavigation();
  const { data: me } = useMe();
  const navItems = me ? NAV_ITEMS.filter((item) => !item.ownerOnly || isOwner(me)) : [];
  const mainRef = useRef<HTMLElement>(null);
  useRouteFocus(mainRef);
  return (
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-4 focus:top-4 focus:z-50 focus:rounded-md focus:bg-panel focus:px-4 focus:py-2">
        Skip to content
      </a>
      <header className="border-b border-line bg-panel">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 px-4 sm:px-6">
          <NavLink to={paths.home.href()} className="flex min-h-touch items-center gap-2 py-3 text-lg font-semibold tracking-tight">
            <img src="/favicon.svg" alt="" className="h-7 w-7" />
            Knitwright
          </NavLink>
          <nav aria-label="Main" className="order-last -mx-1 flex w-full items-center gap-1 overflow-x-auto pb-1 xl:order-none xl:mx-0 xl:w-auto xl:flex-1 xl:pb-0">
            {navItems.map((item) => (
              <NavLink
                key={item.to}
                to={item.to}
                end
                className={({ isActive }) =>
                  `flex min-h-touch items-center whitespace-nowrap rounded-lg px-3 text-sm font-medium ${
                    isActive ? 'bg-accent-soft text-accent-strong' : 'text-muted hover:bg-surface hover:text-ink'
                  }`
                }
              >
                {item.label}
              </NavLink>
            ))}
          </nav>
          <HeaderAccount />
        </div>
      </header>
      {navigation.state === 'loading' && <div className="h-0.5 animate-pulse bg-accent" role="progressbar" aria-label="Loading" />}
      <main id="main" ref={mainRef} tabIndex={-1} className="mx-auto w-full max-w-7xl flex-1 px-4 py-6 sm:px-6 focus:outline-none">
        <Outlet />
      </main>
    </div>
  );
}
