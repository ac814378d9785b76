import { Disclosure, DisclosureButton, DisclosurePanel } from '@headlessui/react';
import type { Account } from '@gramwatt/shared';
import type { ReactNode } from 'react';
import { NavLink, useNavigate, useNavigation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSignOut } from '@/lib/auth';
import { DropdownMenu, DropdownMenuAction, DropdownMenuButton, DropdownMenuItems } from '../ui/menu';
import { cn } from '../ui/cn';
import { GramwattMark } from './gramwatt-mark';

interface NavItem {
  label: string;
  to: string;
}

/**
 * The main sections; Outbox only while the server keeps mail local (with real SMTP there is none to read);
 * Admin only for admins (the server refuses the rest anyway).
 */
export const navItemsFor = (account: Account, { showOutbox = false } = {}): NavItem[] => [
  { label: 'Locker', to: paths.app.locker.getHref() },
  { label: 'Trips', to: paths.app.trips.getHref() },
  ...(showOutbox ? [{ label: 'Outbox', to: paths.app.outbox.getHref() }] : []),
  ...(account.role === 'admin' ? [{ label: 'Admin', to: paths.app.adminAccounts.getHref() }] : []),
];

const initialsOf = (name: string) =>
  name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((part) => part[0]?.toUpperCase())
    .join('') || '?';

function AccountMenu({ account }: { account: Account }) {
  const navigate = useNavigate();
  const signOut = useSignOut({ onSuccess: () => navigate(paths.auth.signIn.getHref(), { replace: true }) });
  return (
    <DropdownMenu>
      <DropdownMenuButton aria-label={`Account: ${account.displayName}`}>
        <span
          aria-hidden="true"
          className="flex size-8 items-center justify-center rounded-full bg-moss-200 text-sm font-semibold text-moss-950"
        >
          {initialsOf(account.displayName)}
        </span>
        <span className="hidden max-w-40 truncate sm:inline">{account.displayName}</span>
        <svg viewBox="0 0 16 16" className="size-4" aria-hidden="true">
          <path d="m4 6 4 4 4-4" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" />
        </svg>
      </DropdownMenuButton>
      <DropdownMenuItems
        header={
          <>
            <p className="truncate font-semibold">{account.displayName}</p>
            <p className="truncate text-sm text-scree-600">{account.email}</p>
            <p className="mt-1 text-xs font-medium tracking-wide text-scree-600 uppercase">
              {account.role === 'admin' ? 'Admin' : 'Member'}
            </p>
          </>
        }
      >
        <DropdownMenuAction onClick={() => signOut.mutate()}>Sign out</DropdownMenuAction>
      </DropdownMenuItems>
    </DropdownMenu>
  );
}

const desktopLinkClasses = ({ isActive }: { isActive: boolean }) =>
  cn(
    'relative inline-flex min-h-11 items-center rounded-lg px-3 font-medium transition-colors hover:bg-scree-800',
    isActive
      ? 'text-white after:absolute after:inset-x-3 after:bottom-0.5 after:h-1 after:rounded-full after:bg-moss-300'
      : 'text-scree-200',
  );

const phoneLinkClasses = ({ isActive }: { isActive: boolean }) =>
  cn(
    'flex min-h-12 items-center rounded-lg border-l-4 px-4 font-medium',
    isActive ? 'border-moss-300 bg-scree-800 text-white' : 'border-transparent text-scree-100 hover:bg-scree-800',
  );

/** The signed-in frame: header with navigation and account menu, the page, a short footer. */
export function AppLayout({
  account,
  showOutbox = false,
  children,
}: {
  account: Account;
  /** Whether mail stays on this server, so the Outbox section has something to show. */
  showOutbox?: boolean;
  children: ReactNode;
}) {
  const navigation = useNavigation();
  const items = navItemsFor(account, { showOutbox });
  return (
    <div className="flex min-h-dvh flex-col bg-firn-50">
      <a
        href="#main"
        className="sr-only z-50 rounded-lg bg-white px-4 py-2 font-medium text-scree-950 focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
      >
        Skip to content
      </a>
      <div
        aria-hidden="true"
        className={cn(
          'fixed inset-x-0 top-0 z-50 h-1 origin-left bg-moss-400 transition-transform duration-500',
          navigation.state === 'idle' ? 'scale-x-0' : 'scale-x-75',
        )}
      />
      <Disclosure as="header" className="bg-scree-900 text-firn-50">
        {({ close }) => (
          <>
            <div className="mx-auto flex max-w-6xl items-center gap-2 px-3 py-2 sm:px-6">
              <DisclosureButton
                className="inline-flex min-h-11 items-center gap-2 rounded-lg px-3 font-medium hover:bg-scree-800 md:hidden"
                aria-label="Menu"
              >
                <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true">
                  <path d="M3 5.5h14M3 10h14M3 14.5h14" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
                </svg>
              </DisclosureButton>
              <NavLink to={paths.app.locker.getHref()} className="mr-4 flex items-center gap-2.5 rounded-lg py-1 pr-2">
                <GramwattMark />
                <span className="text-lg font-semibold tracking-tight">Gramwatt</span>
              </NavLink>
              <nav aria-label="Main" className="hidden md:block">
                <ul className="flex items-center gap-1">
                  {items.map((item) => (
                    <li key={item.to}>
                      <NavLink to={item.to} className={desktopLinkClasses}>
                        {item.label}
                      </NavLink>
                    </li>
                  ))}
                </ul>
              </nav>
              <div className="ml-auto">
                <AccountMenu account={account} />
              </div>
            </div>
            <DisclosurePanel className="border-t border-scree-700 px-3 pt-2 pb-4 md:hidden">
              <nav aria-label="Main">
                <ul className="flex flex-col gap-1">
                  {items.map((item) => (
                    <li key={item.to}>
                      <NavLink to={item.to} className={phoneLinkClasses} onClick={() => close()}>
                        {item.label}
                      </NavLink>
                    </li>
                  ))}
                </ul>
              </nav>
            </DisclosurePanel>
          </>
        )}
      </Disclosure>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 focus:outline-none sm:px-6">
        {children}
      </main>
      <footer className="border-t-2 border-firn-200 px-4 py-5 text-center text-sm text-scree-600 sm:px-6">
        Gramwatt&rsquo;s figures are estimates: carry a margin, and follow the maker&rsquo;s advice for every battery.
      </footer>
    </div>
  );
}

/** A page's heading row inside the app layout. */
export function PageHeader({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div>
        <h1 className="text-2xl font-semibold text-scree-950 sm:text-3xl">{title}</h1>
        {children && <div className="mt-1 max-w-prose text-scree-700">{children}</div>}
      </div>
    </div>
  );
}
