import { Link, Outlet } from 'react-router';
import { CairnMark } from '../components/CairnMark';

export function Layout() {
  return (
    <div className="min-h-screen">
      <header className="border-b border-stone-200 bg-stone-100/60">
        <nav className="mx-auto flex max-w-5xl items-center gap-3 px-6 py-3">
          <Link to="/" className="flex items-center gap-2">
            <CairnMark />
            <span className="font-display text-2xl font-semibold tracking-tight">Cairn</span>
          </Link>
        </nav>
      </header>
      <main className="mx-auto max-w-5xl px-6 py-10">
        <Outlet />
      </main>
    </div>
  );
}
