import type { ReactNode } from 'react';
import { buttonClass } from '../sweep/states';

/** The id of the message beside the control `id`; the control's aria-describedby points to it. */
export const fieldErrorId = (id: string) => `${id}-error`;

/** What a control says of its own message: invalid, and described by the message, while there is one. */
export const invalidProps = (id: string, error: string | undefined) => ({
  'aria-invalid': error ? (true as const) : undefined,
  'aria-describedby': error ? fieldErrorId(id) : undefined,
});

/** The message under a form field, tied to it by id for screen readers. */
export function FieldError({ id, message }: { id: string; message: string | undefined }) {
  if (!message) return null;
  return (
    <p id={id} role="alert" className="mt-1 text-sm text-alarm-600">
      {message}
    </p>
  );
}

interface FieldProps {
  /** The control's id; the label points to it and its message is `fieldErrorId(id)`. */
  id: string;
  label: ReactNode;
  /** The message shown beside the field, if any. */
  error?: string | undefined;
  className?: string;
  labelClassName?: string;
  /** The control, and any hint under it. */
  children: ReactNode;
}

/** One form field: its label, the control (passed in, so any input, select or textarea), and the message beside it. */
export function Field({ id, label, error, className, labelClassName = 'mb-1 block text-sm font-medium', children }: FieldProps) {
  return (
    <div className={className}>
      <label htmlFor={id} className={labelClassName}>
        {label}
      </label>
      {children}
      <FieldError id={fieldErrorId(id)} message={error} />
    </div>
  );
}

/** The end of a form: what went wrong with it as a whole (`problem`), and its submit button (in the look of the sweep, atlas, verify and admin pages), which waits while the form is sent. */
export function FormSubmit({ problem, pending, pendingText, children }: { problem: string | undefined; pending: boolean; pendingText: string; children: string }) {
  return (
    <>
      {problem && (
        <p role="alert" className="text-sm text-alarm-600">
          {problem}
        </p>
      )}
      <button type="submit" className={buttonClass} disabled={pending}>
        {pending ? pendingText : children}
      </button>
    </>
  );
}
