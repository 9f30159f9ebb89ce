import { useQueryClient } from '@tanstack/react-query';
import { useLocation } from 'react-router';
import { sendJson } from '../api/client';
import { meQueryKey, signInHref, useMe } from '../api/me';
import { z } from 'zod';

/** Sign-in link for visitors; for members their name, role and a sign-out button. */
export function AccountMenu() {
  const { data: me, isLoading } = useMe();
  const location = useLocation();
  const queryClient = useQueryClient();
  if (isLoading) return <span className="text-sm text-lichen-500">…</span>;
  if (!me?.user) {
    if (!me?.signIn) return <span className="text-sm text-lichen-500">sign-in not configured</span>;
    return (
      <a className="rounded-md bg-slate-ink px-3 py-1.5 text-sm font-medium text-stone-50 hover:bg-lichen-700" href={signInHref(location.pathname + location.search)}>
        Sign in{me.signIn.provider === 'local' ? ' (local)' : ' with GitHub'}
      </a>
    );
  }
  return (
    <div className="flex items-center gap-3 text-sm">
      <span data-testid="account-name">
        <span className="font-medium">{me.user.displayName ?? me.user.login}</span>{' '}
        <span className="rounded bg-stone-200 px-1.5 py-0.5 text-xs uppercase tracking-wide text-lichen-700" data-testid="account-role">
          {me.user.role}
        </span>
      </span>
      <button
        type="button"
        className="rounded-md border border-stone-200 px-2 py-1 hover:bg-stone-100"
        onClick={async () => {
          await sendJson('POST', '/api/v1/auth/sign-out', undefined, z.unknown());
          await queryClient.invalidateQueries();
        }}
      >
        Sign out
      </button>
    </div>
  );
}
