import { useMe } from '../api/me';
import { ErrorNote, LoadingNote, PermissionNote } from '../components/sweep/states';
import { VerifyForm } from '../components/verify/VerifyForm';

/** /verify: check anyone's labelling of a graph — a certificate from a paper, or an assembly plan from a spreadsheet. */
export function VerifyPage() {
  const me = useMe();
  if (me.isLoading) return <LoadingNote />;
  if (me.isError) return <ErrorNote error={me.error} what="check who is signed in" />;
  if (!me.data?.permissions.includes('runs:write')) return <PermissionNote signedIn={!!me.data?.user} needs="verifying labellings (a researcher's or admin's role)" />;
  return (
    <section className="space-y-6">
      <header className="space-y-2">
        <h1 className="font-display text-3xl font-semibold">Verify a labelling</h1>
        <p className="max-w-2xl text-lichen-700">
          Is it a ranking? Every path between two vertices with the same label must pass a larger label. Paste a labelling — from a paper&rsquo;s table, or
          the step numbers of a workshop&rsquo;s assembly plan — and Cairn checks it; if it fails, the offending path is drawn.
        </p>
      </header>
      <VerifyForm />
    </section>
  );
}
