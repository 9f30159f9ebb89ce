import { zodResolver } from '@hookform/resolvers/zod';
import { DEFAULT_RUN_SECONDS, MAX_RUN_SECONDS, SolveMethod, SweepFamily, SweepRequest, Visibility } from '@cairn/schema';
import { useForm, useWatch, type FieldPath } from 'react-hook-form';
import { useNavigate } from 'react-router';
import type { z } from 'zod';
import { fieldProblems } from '../../api/client';
import { useCreateSweep } from '../../api/sweeps';
import { countCells, MAX_SWEEP_CELLS, mirrorsShare } from './cells';
import { Field, FormSubmit, invalidProps } from '../form/Field';
import { formFieldOf, inputClass } from './states';

/** The shared request schema, plus the cap on cells, so the form refuses what the server would. */
const SweepFormSchema = SweepRequest.superRefine((req, ctx) => {
  const count = countCells(req.family, req.rows, req.cols);
  if (count && count.cells > MAX_SWEEP_CELLS) {
    ctx.addIssue({ code: 'custom', path: ['cells'], message: `${count.cells} cells is more than the ${MAX_SWEEP_CELLS} one sweep may make; narrow a range` });
  }
});
type FormInput = z.input<typeof SweepFormSchema>;
type FormOutput = z.output<typeof SweepFormSchema>;

const FIELDS: readonly string[] = ['name', 'family', 'rows.from', 'rows.to', 'cols.from', 'cols.to', 'method', 'timeLimitSeconds', 'visibility'];

const FAMILY_HELP: Record<SweepFamily, string> = {
  grid: 'rows × cols grid; a cell and its mirror share one run',
  cylinder: 'rows are paths, columns close into cycles; no mirror sharing',
  torus: 'both directions close into cycles (sizes at least 3); mirrors share one run',
};

const METHOD_HELP: Record<SolveMethod, string> = {
  auto: 'Cairn picks: closed form, then exact search, then bounds',
  exact: 'exact search until the time limit, then the best interval',
  bounds: 'lower bound and construction only, fast',
  formula: 'closed forms only; cells without one stay unknown',
};

const AXIS_WORDS = { rows: 'Rows', cols: 'Columns' } as const;

const emptyToUndefined = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? undefined : v);

/** New sweep: a family, a range of rows and of columns, and how to solve each cell. */
export function SweepForm() {
  const navigate = useNavigate();
  const create = useCreateSweep();
  const {
    register,
    handleSubmit,
    control,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(SweepFormSchema),
    defaultValues: { family: 'grid', rows: { from: 1, to: 6 }, cols: { from: 1, to: 12 }, method: 'auto', timeLimitSeconds: DEFAULT_RUN_SECONDS, visibility: 'private' },
  });
  const [family, rows, cols] = useWatch({ control, name: ['family', 'rows', 'cols'] });
  const count = countCells(family, { from: Number(rows?.from), to: Number(rows?.to) }, { from: Number(cols?.from), to: Number(cols?.to) });
  const tooMany = count !== null && count.cells > MAX_SWEEP_CELLS;
  const cellsError = (errors as { cells?: { message?: string } }).cells?.message;

  const onSubmit = async (body: FormOutput) => {
    try {
      const id = await create.mutateAsync(body);
      await navigate(`/sweeps/${id}`);
    } catch (err) {
      const problems = fieldProblems(err);
      const unplaced: string[] = [];
      for (const p of problems) {
        const field = formFieldOf(p.field);
        if (FIELDS.includes(field)) setError(field as FieldPath<FormInput>, { message: p.message });
        else unplaced.push(p.message);
      }
      if (problems.length === 0 || unplaced.length > 0) setError('root', { message: unplaced.length > 0 ? unplaced.join('; ') : err instanceof Error ? err.message : String(err) });
    }
  };

  const err = (name: string) => {
    const parts = name.split('.');
    let node: unknown = errors;
    for (const p of parts) node = (node as Record<string, unknown> | undefined)?.[p];
    return (node as { message?: string } | undefined)?.message;
  };
  const idOf = (name: string) => `sweep-${name.replace('.', '-')}`;
  const invalid = (name: string) => invalidProps(idOf(name), err(name));
  /** One end of the rows or columns range, labelled for screen readers only ("Rows from"). */
  const rangeEnd = (axis: 'rows' | 'cols', end: 'from' | 'to') => (
    <Field id={idOf(`${axis}.${end}`)} label={`${AXIS_WORDS[axis]} ${end}`} error={err(`${axis}.${end}`)} className="flex-1" labelClassName="sr-only">
      <input id={idOf(`${axis}.${end}`)} type="number" inputMode="numeric" min={1} className={inputClass} {...register(`${axis}.${end}`, { valueAsNumber: true })} {...invalid(`${axis}.${end}`)} />
    </Field>
  );

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-4 rounded-lg border border-stone-200 bg-stone-100/50 p-4 sm:p-5" aria-labelledby="sweep-form-title">
      <h2 id="sweep-form-title" className="font-display text-xl font-semibold">
        New sweep
      </h2>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field
          id="sweep-name"
          label={
            <>
              Name <span className="font-normal text-lichen-500">(optional)</span>
            </>
          }
          error={err('name')}
        >
          <input id="sweep-name" className={inputClass} placeholder="Grid tables for the spring seminar" {...register('name', { setValueAs: emptyToUndefined })} {...invalid('name')} />
        </Field>
        <Field id="sweep-family" label="Family" error={err('family')}>
          <select id="sweep-family" className={inputClass} {...register('family')} {...invalid('family')} aria-describedby="sweep-family-help">
            {SweepFamily.options.map((f) => (
              <option key={f} value={f}>
                {f}
              </option>
            ))}
          </select>
          <p id="sweep-family-help" className="mt-1 text-xs text-lichen-700">
            {FAMILY_HELP[family]}
          </p>
        </Field>
      </div>

      <div className="grid gap-4 sm:grid-cols-2">
        {(['rows', 'cols'] as const).map((axis) => (
          <fieldset key={axis} className="min-w-0">
            <legend className="mb-1 text-sm font-medium">{AXIS_WORDS[axis]}</legend>
            <div className="flex items-start gap-2">
              {rangeEnd(axis, 'from')}
              <span className="pt-1.5 text-lichen-700" aria-hidden="true">
                to
              </span>
              {rangeEnd(axis, 'to')}
            </div>
          </fieldset>
        ))}
      </div>

      <p
        data-testid="sweep-cell-count"
        aria-live="polite"
        role={tooMany ? 'alert' : undefined}
        className={`rounded-md px-3 py-2 text-sm ${tooMany ? 'border border-alarm-600/40 bg-alarm-600/5 text-alarm-600' : 'bg-stone-50 text-lichen-700'}`}
      >
        {count === null
          ? 'Give both ranges to see how many cells the sweep makes.'
          : tooMany
            ? (cellsError ?? `${count.cells} cells is more than the ${MAX_SWEEP_CELLS} one sweep may make; narrow a range`)
            : `${count.cells} cell${count.cells === 1 ? '' : 's'}${mirrorsShare(family) && count.runs < count.cells ? `, computed by ${count.runs} runs (mirror cells share)` : ''} · at most ${MAX_SWEEP_CELLS}`}
      </p>

      <div className="grid gap-4 sm:grid-cols-3">
        <Field id="sweep-method" label="Method" error={err('method')}>
          <select id="sweep-method" className={inputClass} {...register('method')} {...invalid('method')}>
            {SolveMethod.options.map((m) => (
              <option key={m} value={m}>
                {m} — {METHOD_HELP[m]}
              </option>
            ))}
          </select>
        </Field>
        <Field id="sweep-timeLimitSeconds" label="Time limit per run (seconds)" error={err('timeLimitSeconds')}>
          <input
            id="sweep-timeLimitSeconds"
            type="number"
            inputMode="numeric"
            min={1}
            max={MAX_RUN_SECONDS}
            className={inputClass}
            {...register('timeLimitSeconds', { valueAsNumber: true })}
            {...invalid('timeLimitSeconds')}
          />
        </Field>
        <Field id="sweep-visibility" label="Who may see it" error={err('visibility')}>
          <select id="sweep-visibility" className={inputClass} {...register('visibility')} {...invalid('visibility')}>
            {Visibility.options.map((v) => (
              <option key={v} value={v}>
                {v === 'private' ? 'private — you and admins' : v === 'link' ? 'link — anyone with the link' : 'public — every member'}
              </option>
            ))}
          </select>
        </Field>
      </div>

      <FormSubmit problem={errors.root?.message} pending={isSubmitting} pendingText="Starting…">
        Start sweep
      </FormSubmit>
    </form>
  );
}
