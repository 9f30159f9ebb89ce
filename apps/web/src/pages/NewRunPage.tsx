import { zodResolver } from '@hookform/resolvers/zod';
import { SolveMethod, Visibility } from '@cairn/schema';
import { useId } from 'react';
import { Controller, useForm, type FieldErrors } from 'react-hook-form';
import { useNavigate } from 'react-router';
import { ApiRequestError, fieldProblems } from '../api/client';
import { signInHref, useCan, useMe } from '../api/me';
import { useCreateRun } from '../api/runs';
import { Field, FieldError, invalidProps } from '../components/form/Field';
import { ErrorNote, Loading, buttonClass, inputClass } from '../components/run/bits';
import { FAMILY_FORM, FORM_FAMILIES, NEW_RUN_DEFAULTS, NewRunSchema, fieldOfServerProblem, requestBodyOf, type FormField, type NewRunValues } from '../components/run/new-run-form';
import { METHOD_WORDS } from '../components/run/words';
import { MaskEditor } from '../components/mask-editor/MaskEditor';
import { GraphUpload } from '../components/upload/GraphUpload';

const VISIBILITY_WORDS: Record<Visibility, string> = {
  private: 'Private: you and the admins',
  link: 'Anyone holding the share link',
  public: 'Public: every member, and the home page',
};

export function NewRunPage() {
  const me = useMe();
  const canWrite = useCan('runs:write');
  if (me.isPending) return <Loading what="your account" />;
  if (me.isError) return <ErrorNote error={me.error} what="Cannot tell who you are" />;
  if (!canWrite) {
    return (
      <section className="space-y-3">
        <h1 className="font-display text-3xl font-semibold">New run</h1>
        {me.data.user ? (
          <p>Your role ({me.data.user.role}) may read runs but not start them. Ask an admin for the researcher role.</p>
        ) : (
          <p>
            <a className="text-ochre-700 underline" href={signInHref('/runs/new')}>
              Sign in
            </a>{' '}
            to start a run.
          </p>
        )}
      </section>
    );
  }
  return <NewRunForm />;
}

/** The message of a field, or of the spec as a whole for the size fields. */
const messageOf = (errors: FieldErrors<NewRunValues>, field: FormField) => errors[field]?.message;
/** This form's labels sit right on their controls, with no gap below. */
const LABEL_CLASS = 'block text-sm font-medium';

export function NewRunForm() {
  const navigate = useNavigate();
  const create = useCreateRun();
  const id = useId();
  const fid = (f: string) => `${id}-${f}`;
  const {
    register,
    handleSubmit,
    watch,
    control,
    setValue,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<NewRunValues>({ resolver: zodResolver(NewRunSchema), defaultValues: NEW_RUN_DEFAULTS, mode: 'onSubmit', reValidateMode: 'onChange' });
  const family = watch('family');
  const graphName = watch('graphName');
  const described = FAMILY_FORM[family];

  const onSubmit = async (values: NewRunValues) => {
    try {
      const run = await create.mutateAsync(requestBodyOf(values));
      navigate(`/runs/${run.id}`);
    } catch (err) {
      const problems = fieldProblems(err);
      for (const p of problems) {
        const field = fieldOfServerProblem(p.field);
        if (field) setError(field, { type: 'server', message: p.message });
        else setError('root.spec', { type: 'server', message: p.message });
      }
      if (problems.length === 0) setError('root.server', { type: 'server', message: err instanceof ApiRequestError ? err.message : String(err) });
    }
  };

  const numberField = (field: FormField, label: string, step?: string) => {
    const message = messageOf(errors, field);
    return (
      <Field key={field} id={fid(field)} label={label} error={message} className="w-36" labelClassName={LABEL_CLASS}>
        <input
          id={fid(field)}
          type="number"
          inputMode={step ? 'decimal' : 'numeric'}
          step={step ?? 1}
          className={inputClass}
          {...invalidProps(fid(field), message)}
          {...register(field, { valueAsNumber: true })}
        />
      </Field>
    );
  };

  return (
    <section className="space-y-6">
      <header className="space-y-1">
        <h1 className="font-display text-3xl font-semibold">New run</h1>
        <p className="text-lichen-700">Name a graph, say how hard Cairn may try, and follow the run as it searches.</p>
      </header>
      <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-6" aria-label="New run">
        <fieldset className="space-y-4 rounded-lg border border-stone-200 p-4">
          <legend className="px-1 font-display text-lg font-semibold">Graph</legend>
          <Field id={fid('family')} label="Family" error={messageOf(errors, 'family')} className="max-w-sm" labelClassName={LABEL_CLASS}>
            <select id={fid('family')} className={inputClass} {...register('family')} aria-describedby={fid('family-explain')}>
              {FORM_FAMILIES.map((f) => (
                <option key={f} value={f}>
                  {FAMILY_FORM[f].label}
                </option>
              ))}
            </select>
            <p id={fid('family-explain')} className="mt-1 text-sm text-lichen-700">
              {described.explain}
            </p>
          </Field>
          {described.sizes.length > 0 && <div className="flex flex-wrap gap-3">{described.sizes.map((s) => numberField(s.field, s.label, s.step))}</div>}
          {family === 'mask' && (
            <Controller
              control={control}
              name="maskText"
              render={({ field, fieldState }) => <MaskEditor value={field.value} onChange={field.onChange} problem={fieldState.error?.message} label="Mask cells" />}
            />
          )}
          {family === 'upload' && (
            <div className="space-y-2">
              <GraphUpload
                problem={messageOf(errors, 'graphId')}
                onUploaded={(r) => {
                  setValue('graphId', r.graph.id, { shouldValidate: true });
                  setValue('graphName', r.graph.name);
                }}
              />
              {graphName && (
                <p className="text-sm" data-testid="chosen-graph">
                  The run will use <span className="font-medium">{graphName}</span>.
                </p>
              )}
            </div>
          )}
          <FieldError id={fid('spec-error')} message={errors.root?.spec?.message} />
        </fieldset>

        <fieldset className="space-y-2 rounded-lg border border-stone-200 p-4">
          <legend className="px-1 font-display text-lg font-semibold">Method</legend>
          {SolveMethod.options.map((m) => (
            <label key={m} className="flex items-start gap-2 rounded-md p-1 hover:bg-stone-100">
              <input type="radio" value={m} className="mt-1 accent-lichen-700" {...register('method')} aria-describedby={fid(`method-${m}`)} />
              <span>
                <span className="font-medium">{METHOD_WORDS[m].name}</span>
                <span id={fid(`method-${m}`)} className="block text-sm text-lichen-700">
                  {METHOD_WORDS[m].explain}
                </span>
              </span>
            </label>
          ))}
          <FieldError id={fid('method-error')} message={messageOf(errors, 'method')} />
        </fieldset>

        <fieldset className="flex flex-wrap gap-4 rounded-lg border border-stone-200 p-4">
          <legend className="px-1 font-display text-lg font-semibold">Limits and who sees it</legend>
          <Field id={fid('timeLimitSeconds')} label="Time limit (seconds)" error={messageOf(errors, 'timeLimitSeconds')} className="w-48" labelClassName={LABEL_CLASS}>
            <input
              id={fid('timeLimitSeconds')}
              type="number"
              inputMode="numeric"
              className={inputClass}
              aria-invalid={errors.timeLimitSeconds ? true : undefined}
              aria-describedby={`${fid('time-hint')}${errors.timeLimitSeconds ? ` ${fid('timeLimitSeconds-error')}` : ''}`}
              {...register('timeLimitSeconds', { valueAsNumber: true })}
            />
            <p id={fid('time-hint')} className="mt-1 text-xs text-lichen-700">
              1 to 3600. When it runs out you keep the best proven interval.
            </p>
          </Field>
          <Field id={fid('visibility')} label="Who sees it" error={messageOf(errors, 'visibility')} className="w-72" labelClassName={LABEL_CLASS}>
            <select id={fid('visibility')} className={inputClass} {...register('visibility')}>
              {Visibility.options.map((v) => (
                <option key={v} value={v}>
                  {VISIBILITY_WORDS[v]}
                </option>
              ))}
            </select>
          </Field>
        </fieldset>

        {errors.root?.server?.message && <ErrorNote error={new Error(errors.root.server.message)} what="The run was not started" />}
        <button type="submit" className={buttonClass} disabled={isSubmitting}>
          {isSubmitting ? 'Starting…' : 'Start the run'}
        </button>
      </form>
    </section>
  );
}
