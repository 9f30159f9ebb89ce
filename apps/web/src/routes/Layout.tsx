import { Suspense } from 'react';
import { Link, NavLink, Outlet } from 'react-router';
import { useCan } from '../api/me';
import { AccountMenu } from '../components/AccountMenu';
import { CairnMark } from '../components/CairnMark';

const navClass = ({ isActive }: { isActive: boolean }) =>
  `rounded-md px-2 py-1 text-sm ${isActive ? 'bg-stone-200 font-medium text-slate-ink' : 'text-lichen-700 hover:bg-stone-100'}`;

/** The frame of every page: Cairn's mark, the sections a member may use, the account menu. */
export function Layout() {
  const canRead = useCan('runs:read');
  const canWrite = useCan('runs:write');
  const isAdmin = useCan('admin');
  return (
    <div className="min-h-screen">
      <a href="#main" className="sr-only focus:not-sr-only">
        Skip to content
      </a>
      <header className="border-b border-stone-200 bg-stone-100/60">
        <nav className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-3 gap-y-2 px-4 py-3 sm:px-6" aria-label="Main">
          <Link to="/" className="mr-2 flex items-center gap-2">
            <CairnMark />
            <span className="font-display text-2xl font-semibold tracking-tight">Cairn</span>
          </Link>
          <NavLink to="/atlas" className={navClass}>
            Atlas
          </NavLink>
          {canRead && (
            <NavLink to="/runs" end className={navClass}>
              Runs
            </NavLink>
          )}
          {canWrite && (
            <NavLink to="/runs/new" className={navClass}>
              New run
            </NavLink>
          )}
          {canRead && (
            <NavLink to="/sweeps" className={navClass}>
              Sweeps
            </NavLink>
          )}
          {canWrite && (
            <NavLink to="/verify" className={navClass}>
              Verify
            </NavLink>
          )}
          {isAdmin && (
            <NavLink to="/admin" className={navClass}>
              Admin
            </NavLink>
          )}
          <span className="ml-auto">
            <AccountMenu />
          </span>
        </nav>
      </header>
      <main id="main" className="mx-auto max-w-6xl px-4 py-8 sm:px-6">
        <Suspense fallback={<p className="text-lichen-500">Loading…</p>}>
          <Outlet />
        </Suspense>
      </main>
    </div>
  );
}
