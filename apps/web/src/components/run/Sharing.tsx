import { zodResolver } from '@hookform/resolvers/zod';
import { RunShareRequest, Visibility, type RunView } from '@cairn/schema';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import { fieldProblems } from '../../api/client';
import { useRunVisibility, useShareRun } from '../../api/runs';
import { FieldError } from '../form/Field';
import { ErrorNote, buttonClass, inputClass, quietButtonClass } from './bits';

const VISIBILITY_WORDS: Record<Visibility, string> = {
  private: 'Private: you and the admins',
  link: 'Anyone holding the share link',
  public: 'Public: every member',
};

/** Who sees the run; `private` revokes the share link, `link` makes one. */
export function VisibilityControl({ run }: { run: RunView }) {
  const id = useId();
  const change = useRunVisibility(run.id);
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium">
        Who sees this run
      </label>
      <select
        id={id}
        className={`${inputClass} max-w-xs`}
        value={change.isPending ? change.variables : run.visibility}
        disabled={change.isPending}
        onChange={(e) => change.mutate(e.target.value as Visibility)}
      >
        {Visibility.options.map((v) => (
          <option key={v} value={v}>
            {VISIBILITY_WORDS[v]}
          </option>
        ))}
      </select>
      <p aria-live="polite" className="text-xs text-lichen-700">
        {change.isPending ? 'Saving…' : change.isSuccess ? 'Saved.' : ''}
      </p>
      {change.isError && <ErrorNote error={change.error} what="Not changed" />}
    </div>
  );
}

/** The share link with a copy button. */
export function ShareLink({ url }: { url: string }) {
  const id = useId();
  const [note, setNote] = useState('');
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium">
        Share link
      </label>
      <div className="flex flex-col gap-2 sm:flex-row">
        <input id={id} readOnly value={url} className={`${inputClass} font-mono text-xs`} onFocus={(e) => e.target.select()} data-testid="share-link" />
        <button
          type="button"
          className={quietButtonClass}
          onClick={async () => {
            try {
              await navigator.clipboard.writeText(url);
              setNote('Link copied.');
            } catch {
              setNote('The browser did not allow copying; select the link and copy it by hand.');
            }
          }}
        >
          Copy link
        </button>
      </div>
      <p aria-live="polite" className="text-xs text-lichen-700">
        {note}
      </p>
    </div>
  );
}

/** Mails the share link to someone; the run becomes readable by link if it was private. */
export function ShareBox({ run }: { run: RunView }) {
  const id = useId();
  const share = useShareRun(run.id);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<RunShareRequest>({ resolver: zodResolver(RunShareRequest), defaultValues: { email: '' } });
  const onSubmit = async ({ email }: RunShareRequest) => {
    try {
      await share.mutateAsync(email);
      reset({ email: '' });
    } catch (err) {
      const problems = fieldProblems(err);
      setError('email', { type: 'server', message: problems.find((p) => p.field === 'body.email')?.message ?? (err instanceof Error ? err.message : String(err)) });
    }
  };
  // The run's own link decides: once it is private again the link is gone, even one mailed a moment ago.
  const link = run.links.shared === null ? null : (share.data?.url ?? run.links.shared);
  return (
    <div className="space-y-3">
      <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-1" aria-label="Share by mail">
        <label htmlFor={id} className="block text-sm font-medium">
          Send the link to
        </label>
        <div className="flex flex-col gap-2 sm:flex-row">
          <input
            id={id}
            type="email"
            autoComplete="email"
            placeholder="colleague@example.org"
            className={`${inputClass} sm:max-w-xs`}
            aria-invalid={errors.email ? true : undefined}
            aria-describedby={errors.email ? `${id}-error` : undefined}
            {...register('email')}
          />
          <button type="submit" className={buttonClass} disabled={share.isPending}>
            {share.isPending ? 'Sending…' : 'Share'}
          </button>
        </div>
        <FieldError id={`${id}-error`} message={errors.email?.message} />
        <p aria-live="polite" className="text-sm text-lichen-700">
          {share.data && (share.data.mailed ? 'The link was mailed.' : 'The mail did not go out, but the link below works: send it yourself.')}
        </p>
      </form>
      {link && <ShareLink url={link} />}
    </div>
  );
}
