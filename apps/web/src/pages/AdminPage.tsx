import { Navigate, NavLink, Route, Routes, useLocation } from 'react-router';
import { signInHref, useMe } from '../api/me';
import { KeysPanel } from '../components/admin/KeysPanel';
import { MailPanel } from '../components/admin/MailPanel';
import { MembersPanel } from '../components/admin/MembersPanel';
import { EmptyNote, ErrorNote, LoadingNote } from '../components/sweep/states';

const tabClass = ({ isActive }: { isActive: boolean }) =>
  `rounded-md px-3 py-1.5 text-sm ${isActive ? 'bg-slate-ink text-stone-50' : 'text-lichen-700 hover:bg-stone-100'} focus:outline-none focus-visible:ring-2 focus-visible:ring-ochre-500`;

/** /admin/*: members and roles, API keys, and the local mail catcher — for admins signed in with a session. */
export function AdminPage() {
  const me = useMe();
  const location = useLocation();
  if (me.isLoading) return <LoadingNote />;
  if (me.isError) return <ErrorNote error={me.error} what="check who is signed in" />;
  if (!me.data?.permissions.includes('admin')) {
    return (
      <section className="space-y-3 rounded-md border border-stone-200 bg-stone-100/60 px-4 py-5" data-testid="admins-only">
        <h1 className="font-display text-2xl font-semibold">Admins only</h1>
        <p className="text-lichen-700">
          {me.data?.user
            ? `These pages manage members, API keys and mail; your role (${me.data.user.role}) does not reach them. Another admin can change that.`
            : 'These pages manage members, API keys and mail. Sign in with an admin account to use them.'}
        </p>
        {!me.data?.user && (
          <a className="inline-block rounded-md bg-slate-ink px-3 py-1.5 text-sm font-medium text-stone-50 hover:bg-lichen-700" href={signInHref(location.pathname)}>
            Sign in
          </a>
        )}
      </section>
    );
  }
  return (
    <section className="space-y-6">
      <header className="space-y-3">
        <h1 className="font-display text-3xl font-semibold">Admin</h1>
        <nav aria-label="Admin sections" className="flex flex-wrap gap-2">
          <NavLink to="/admin/members" className={tabClass}>
            Members
          </NavLink>
          <NavLink to="/admin/keys" className={tabClass}>
            API keys
          </NavLink>
          <NavLink to="/admin/mail" className={tabClass}>
            Mail
          </NavLink>
        </nav>
      </header>
      <Routes>
        <Route index element={<Navigate to="/admin/members" replace />} />
        <Route path="members" element={<MembersPanel />} />
        <Route path="keys" element={<KeysPanel />} />
        <Route path="mail" element={<MailPanel />} />
        <Route path="*" element={<EmptyNote>No such admin page. Pick one of the sections above.</EmptyNote>} />
      </Routes>
    </section>
  );
}
