import { useState } from 'react';
import { useCaughtMail } from '../../api/admin';
import { EmptyNote, ErrorNote, formatWhen, LoadingNote, quietButtonClass } from '../sweep/states';

const PAGE = 20;

/** The local mail catcher's inbox: what Cairn would have e-mailed (run finished, run shared), newest first. */
export function MailPanel() {
  const mail = useCaughtMail();
  const [shown, setShown] = useState(PAGE);
  if (mail.isLoading) return <LoadingNote>Loading caught mail…</LoadingNote>;
  if (mail.isError) return <ErrorNote error={mail.error} what="read the caught mail" />;
  const heading = (
    <h2 id="mail-title" className="font-display text-xl font-semibold">
      Mail
    </h2>
  );
  if (mail.data === null) {
    return (
      <section className="space-y-3" aria-labelledby="mail-title">
        {heading}
        <p className="rounded-md border border-stone-200 bg-stone-100/60 px-4 py-4 text-slate-ink" data-testid="mail-real-service">
          Mail is sent by a real mail service here, so there is no local catcher to read. Look in the recipients&rsquo; inboxes or the mail service&rsquo;s own log.
        </p>
      </section>
    );
  }
  const messages = [...(mail.data?.messages ?? [])].sort((a, b) => Date.parse(b.receivedAt) - Date.parse(a.receivedAt));
  return (
    <section className="space-y-3" aria-labelledby="mail-title">
      {heading}
      <p className="text-sm text-lichen-700">The local mail catcher keeps every message Cairn sends while it runs; nothing leaves this machine.</p>
      {messages.length === 0 ? (
        <EmptyNote>No mail caught yet. Sharing a run by e-mail, or a run finishing for someone who asked to be told, sends one.</EmptyNote>
      ) : (
        <>
          <ul className="space-y-2" data-testid="mail-list">
            {messages.slice(0, shown).map((m) => (
              <li key={m.id} className="rounded-md border border-stone-200 bg-white/50">
                <details>
                  <summary className="flex cursor-pointer flex-wrap items-baseline gap-x-3 gap-y-1 px-3 py-2">
                    <span className="font-medium">{m.subject || '(no subject)'}</span>
                    <span className="text-sm text-lichen-700">to {m.to.join(', ')}</span>
                    <span className="ml-auto whitespace-nowrap text-xs text-lichen-500">{formatWhen(m.receivedAt)}</span>
                  </summary>
                  <div className="space-y-2 border-t border-stone-200 px-3 py-2">
                    <p className="text-xs text-lichen-500">from {m.from}</p>
                    <pre className="overflow-x-auto whitespace-pre-wrap break-words font-mono text-xs">{m.text}</pre>
                  </div>
                </details>
              </li>
            ))}
          </ul>
          {messages.length > shown && (
            <button type="button" className={quietButtonClass} onClick={() => setShown(shown + PAGE)}>
              Show {Math.min(PAGE, messages.length - shown)} more of {messages.length - shown}
            </button>
          )}
        </>
      )}
    </section>
  );
}
