import { zodResolver } from '@hookform/resolvers/zod';
import { ApiKeyCreateRequest, ApiScope, type ApiKeyCreatedResponse } from '@cairn/schema';
import { useState } from 'react';
import { useForm, type FieldPath } from 'react-hook-form';
import { z } from 'zod';
import { useCreateKey, useMembers } from '../../api/admin';
import { fieldProblems } from '../../api/client';
import { Field, FieldError, FormSubmit, invalidProps } from '../form/Field';
import { buttonClass, ErrorNote, formFieldOf, inputClass, quietButtonClass } from '../sweep/states';

/** The shared request with sentences for an empty member or name (the schema's own words are terse there). */
const KeyFormSchema = ApiKeyCreateRequest.extend({
  userId: z.string().min(1, 'Pick the member the key acts for').pipe(ApiKeyCreateRequest.shape.userId),
  name: z.string().trim().min(1, 'Give the key a name, such as "seminar tables script"').max(100, 'A name is at most 100 characters'),
});
type FormInput = z.input<typeof KeyFormSchema>;
type FormOutput = z.output<typeof KeyFormSchema>;

const SCOPE_WORDS: Record<ApiScope, string> = {
  'runs:read': 'read runs and sweeps',
  'runs:write': 'start runs, sweeps and uploads',
  'atlas:read': 'read the atlas',
};

/** Make a key for a member; the answer's secret is shown once, in the box below the form. */
export function KeyCreateForm() {
  const members = useMembers();
  const create = useCreateKey();
  const [created, setCreated] = useState<ApiKeyCreatedResponse | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<FormInput, unknown, FormOutput>({ resolver: zodResolver(KeyFormSchema), defaultValues: { userId: '', name: '', scopes: ['runs:read'] } });

  const onSubmit = async (body: FormOutput) => {
    try {
      setCreated(await create.mutateAsync(body));
      reset();
    } catch (err) {
      const problems = fieldProblems(err);
      for (const p of problems) setError(formFieldOf(p.field) as FieldPath<FormInput>, { message: p.message });
      if (problems.length === 0) setError('root', { message: err instanceof Error ? err.message : String(err) });
    }
  };

  return (
    <div className="space-y-4">
      <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-4 rounded-lg border border-stone-200 bg-stone-100/50 p-4" aria-labelledby="key-form-title">
        <h3 id="key-form-title" className="font-display text-lg font-semibold">
          New API key
        </h3>
        <div className="grid gap-4 sm:grid-cols-2">
          <Field id="key-userId" label="Acts for" error={errors.userId?.message}>
            {members.isError ? (
              <ErrorNote error={members.error} what="list the members" />
            ) : (
              <select id="key-userId" className={inputClass} disabled={members.isLoading} {...register('userId')} {...invalidProps('key-userId', errors.userId?.message)}>
                <option value="">{members.isLoading ? 'Loading members…' : 'Pick a member'}</option>
                {members.data?.users.map((m) => (
                  <option key={m.id} value={m.id}>
                    {m.login} ({m.role})
                  </option>
                ))}
              </select>
            )}
          </Field>
          <Field id="key-name" label="Name" error={errors.name?.message}>
            <input id="key-name" className={inputClass} placeholder="nightly grid tables" {...register('name')} {...invalidProps('key-name', errors.name?.message)} />
          </Field>
        </div>
        <fieldset aria-describedby={errors.scopes ? 'key-scopes-error' : 'key-scopes-help'}>
          <legend className="mb-1 text-sm font-medium">Scopes</legend>
          <p id="key-scopes-help" className="mb-2 text-xs text-lichen-700">
            Never more than the member&rsquo;s role allows, whatever is ticked.
          </p>
          <div className="flex flex-wrap gap-x-5 gap-y-2">
            {ApiScope.options.map((s) => (
              <label key={s} className="inline-flex items-center gap-2 text-sm">
                <input type="checkbox" value={s} {...register('scopes')} />
                <span className="font-mono text-xs">{s}</span> <span className="text-lichen-700">{SCOPE_WORDS[s]}</span>
              </label>
            ))}
          </div>
          <FieldError id="key-scopes-error" message={errors.scopes?.message ?? errors.scopes?.root?.message} />
        </fieldset>
        <FormSubmit problem={errors.root?.message} pending={isSubmitting} pendingText="Making the key…">
          Make key
        </FormSubmit>
      </form>
      {created && <SecretBox created={created} onDone={() => setCreated(null)} />}
    </div>
  );
}

/** The new key's secret, this once: copy it, then it is gone from the page for good. */
function SecretBox({ created, onDone }: { created: ApiKeyCreatedResponse; onDone: () => void }) {
  const [copy, setCopy] = useState<'idle' | 'copied' | 'failed'>('idle');
  return (
    <section role="status" aria-labelledby="secret-title" className="space-y-3 rounded-lg border-2 border-ochre-500 bg-ochre-500/10 p-4" data-testid="key-secret">
      <h3 id="secret-title" className="font-display text-lg font-semibold">
        Key &ldquo;{created.key.name}&rdquo; for {created.key.owner.login}
      </h3>
      <p className="text-sm font-medium text-ochre-700">Copy the secret now. Cairn keeps only its hash: it will not be shown again, here or anywhere.</p>
      <div className="flex flex-col gap-2 sm:flex-row">
        <label htmlFor="key-secret-value" className="sr-only">
          Secret of the new key
        </label>
        <input id="key-secret-value" readOnly value={created.secret} onFocus={(e) => e.currentTarget.select()} className={`${inputClass} font-mono`} />
        <button
          type="button"
          className={`${buttonClass} whitespace-nowrap`}
          onClick={async () => {
            try {
              await navigator.clipboard.writeText(created.secret);
              setCopy('copied');
            } catch {
              setCopy('failed');
            }
          }}
        >
          Copy secret
        </button>
      </div>
      <p className="text-sm text-lichen-700" aria-live="polite">
        {copy === 'copied' ? 'Copied to the clipboard.' : copy === 'failed' ? 'The browser refused the clipboard: select the secret and copy it by hand.' : ' '}
      </p>
      <button type="button" className={quietButtonClass} onClick={onDone}>
        I have stored it — hide the secret
      </button>
    </section>
  );
}
