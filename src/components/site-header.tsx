import { useCallback, useEffect, useId, useRef, useState } from 'react';
import { Link, NavLink, useLocation, useNavigate } from 'react-router';
import type { PublicUser } from '@shared/schemas/auth';
import { hasRole } from '@shared/schemas/common';
import { useMe, useSignOut } from '@/lib/auth';
import { buttonClasses } from './button';
import { LeafMark } from './leaf-mark';
import { SiteSearch } from './site-search';

interface NavItem {
  to: string;
  label: string;
  end?: boolean;
}

function navItemsFor(user: PublicUser | null | undefined): NavItem[] {
  const items: NavItem[] = [
    { to: '/', label: 'Home', end: true },
    { to: '/tours', label: 'Tours' },
    { to: '/finder', label: 'Tree finder' },
    { to: '/learn', label: 'Learn' },
    { to: '/cultivars', label: 'Cultivars' },
    { to: '/glossary', label: 'Glossary' },
  ];
  // Only hides the links; the server refuses uploads to anyone below author.
  if (hasRole(user?.role, 'author')) items.push({ to: '/my/tours', label: 'My tours' });
  // Only hides the link; the server refuses the queue to anyone below moderator.
  if (hasRole(user?.role, 'moderator')) items.push({ to: '/moderation/spelling', label: 'Spelling fixes' });
  // Only hides the links; the server refuses these pages to anyone who is not an admin.
  if (hasRole(user?.role, 'admin')) {
    items.push({ to: '/admin/users', label: 'Users' }, { to: '/admin/outbox', label: 'Outbox' });
  }
  return items;
}

const navLinkClass = ({ isActive }: { isActive: boolean }) =>
  'block whitespace-nowrap rounded-md px-3 py-2 font-bold no-underline ' +
  (isActive ? 'bg-moss-wash text-moss-deep' : 'text-ink hover:bg-bark-wash hover:text-ink');

/**
 * Where the bar switches from the Menu button to the full row of links: signed-in members with
 * more links need a wider screen before the row fits on one line.
 */
function breakpointFor(items: NavItem[]) {
  return items.length > 6
    ? { block: 'hidden xl:block', flex: 'hidden xl:flex', hide: 'xl:hidden' }
    : { block: 'hidden lg:block', flex: 'hidden lg:flex', hide: 'lg:hidden' };
}

/** Opens on a click, closes on Escape, on a click elsewhere and on the next navigation. */
function useDisclosure() {
  const location = useLocation();
  // Remembering the location the panel was opened at closes it on navigation without an effect.
  const [openAt, setOpenAt] = useState<string | null>(null);
  const open = openAt === location.key;
  const close = useCallback(() => setOpenAt(null), []);
  return { open, close, toggle: () => setOpenAt(open ? null : location.key) };
}

function useSignOutAndLeave() {
  const signOut = useSignOut();
  const navigate = useNavigate();
  return {
    pending: signOut.isPending,
    error: signOut.error,
    run: () => signOut.mutate(undefined, { onSuccess: () => navigate('/') }),
  };
}

function Initial({ name }: { name: string }) {
  return (
    <span aria-hidden="true" className="grid size-8 place-items-center rounded-full bg-moss text-sm font-bold text-card">
      {name.trim().charAt(0).toUpperCase() || '?'}
    </span>
  );
}

function AccountMenu({ user }: { user: PublicUser }) {
  const { open, toggle, close } = useDisclosure();
  const signOut = useSignOutAndLeave();
  const panelId = useId();
  const wrapper = useRef<HTMLDivElement>(null);
  const button = useRef<HTMLButtonElement>(null);

  useEffect(() => {
    if (!open) return;
    const onPointer = (event: PointerEvent) => {
      if (wrapper.current && !wrapper.current.contains(event.target as Node)) close();
    };
    document.addEventListener('pointerdown', onPointer);
    return () => document.removeEventListener('pointerdown', onPointer);
  }, [open, close]);

  return (
    <div
      ref={wrapper}
      className="relative"
      onKeyDown={(event) => {
        if (event.key === 'Escape' && open) {
          close();
          button.current?.focus();
        }
      }}
    >
      <button
        ref={button}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={toggle}
        className="flex items-center gap-2 rounded-full py-1 pr-3 pl-1 font-bold hover:bg-bark-wash"
      >
        <Initial name={user.displayName} />
        <span className="max-w-[12rem] truncate">{user.displayName}</span>
        <svg viewBox="0 0 20 20" className={`size-4 transition-transform ${open ? 'rotate-180' : ''}`} aria-hidden="true">
          <path d="M5 8l5 5 5-5" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
        </svg>
      </button>
      {open && (
        <div id={panelId} className="absolute right-0 z-20 mt-2 w-72 rounded-lg border border-rule bg-card p-2 shadow-leaf">
          <p className="border-b border-rule px-3 pt-1 pb-3 text-sm">
            Signed in as <strong>{user.displayName}</strong>
            <span className="block truncate font-ui text-ink-soft">{user.email}</span>
          </p>
          <ul className="mt-2 space-y-1">
            <li>
              <Link to="/account" className="block rounded-md px-3 py-2 font-bold text-ink no-underline hover:bg-bark-wash">
                Account settings
              </Link>
            </li>
            <li>
              <button
                type="button"
                onClick={signOut.run}
                disabled={signOut.pending}
                className="block w-full rounded-md px-3 py-2 text-left font-bold text-maple hover:bg-maple-wash"
              >
                Sign out
              </button>
            </li>
          </ul>
          {signOut.error != null && (
            <p role="alert" className="px-3 pt-2 text-sm text-maple">
              Signing out did not work. Try again.
            </p>
          )}
        </div>
      )}
    </div>
  );
}

function PhoneMenu({ id, user, items, hideClass }: { id: string; user: PublicUser | null | undefined; items: NavItem[]; hideClass: string }) {
  const signOut = useSignOutAndLeave();
  return (
    <div id={id} className={`border-t border-rule bg-card px-4 pt-2 pb-4 ${hideClass}`}>
      <nav aria-label="Main">
        <ul className="space-y-1">
          {items.map((item) => (
            <li key={item.to}>
              <NavLink to={item.to} end={item.end} className={navLinkClass}>
                {item.label}
              </NavLink>
            </li>
          ))}
        </ul>
      </nav>
      <div className="mt-3 border-t border-rule pt-3">
        {user ? (
          <>
            <p className="px-3 pb-2 text-sm">
              Signed in as <strong>{user.displayName}</strong>
            </p>
            <ul className="space-y-1">
              <li>
                <NavLink to="/account" className={navLinkClass}>
                  Account settings
                </NavLink>
              </li>
              <li>
                <button
                  type="button"
                  onClick={signOut.run}
                  disabled={signOut.pending}
                  className="block w-full rounded-md px-3 py-2 text-left font-bold text-maple hover:bg-maple-wash"
                >
                  Sign out
                </button>
              </li>
            </ul>
          </>
        ) : user === null ? (
          <div className="flex flex-wrap gap-3">
            <Link to="/sign-in" className={buttonClasses('secondary')}>
              Sign in
            </Link>
            <Link to="/sign-up" className={buttonClasses('primary')}>
              Create account
            </Link>
          </div>
        ) : null}
      </div>
    </div>
  );
}

/** The top bar on every page: wordmark, main navigation and the account area (a menu on phones). */
export function SiteHeader() {
  const { data: user } = useMe();
  const items = navItemsFor(user);
  const shown = breakpointFor(items);
  const phone = useDisclosure();
  const phoneMenuId = useId();

  return (
    <header className="border-b border-rule bg-card">
      <div className="mx-auto flex max-w-6xl items-center gap-2 px-4 py-2 sm:px-6 lg:gap-4">
        <Link to="/" className="flex items-center gap-2 rounded-md py-2 pr-2 text-moss-deep no-underline hover:text-moss">
          <LeafMark className="size-8 text-moss" />
          <span className="text-2xl font-bold tracking-tight">Grovewalk</span>
        </Link>

        <nav aria-label="Main" className={shown.block}>
          <ul className="flex flex-wrap gap-0.5">
            {items.map((item) => (
              <li key={item.to}>
                <NavLink to={item.to} end={item.end} className={(state) => navLinkClass(state).replace('px-3', 'px-2')}>
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>

        <div className={`ml-auto items-center gap-3 ${shown.flex}`}>
          {user ? (
            <AccountMenu user={user} />
          ) : user === null ? (
            <>
              <Link to="/sign-in" className="rounded-md px-3 py-2 font-bold text-moss no-underline hover:bg-moss-wash">
                Sign in
              </Link>
              <Link to="/sign-up" className={buttonClasses('primary')}>
                Create account
              </Link>
            </>
          ) : null}
        </div>

        <button
          type="button"
          aria-expanded={phone.open}
          aria-controls={phoneMenuId}
          onClick={phone.toggle}
          className={`ml-auto flex min-h-11 items-center gap-2 rounded-md border border-edge px-3 font-bold ${shown.hide}`}
        >
          <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true">
            {phone.open ? (
              <path d="M5 5l10 10M15 5L5 15" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
            ) : (
              <path d="M3 6h14M3 10h14M3 14h14" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
            )}
          </svg>
          Menu
        </button>
      </div>
      <div className="mx-auto flex max-w-6xl px-4 pb-2 sm:px-6">
        <SiteSearch className="w-full sm:ml-auto sm:max-w-md" />
      </div>
      {phone.open && <PhoneMenu id={phoneMenuId} user={user} items={items} hideClass={shown.hide} />}
    </header>
  );
}
