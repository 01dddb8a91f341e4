import { useId, type InputHTMLAttributes, type SelectHTMLAttributes, type TextareaHTMLAttributes } from 'react';
import { cx } from './cx';

const control =
  'block w-full rounded-md border bg-surface px-3 text-ink placeholder:text-ink-faint ' +
  'focus-visible:outline-offset-0 disabled:bg-sunken disabled:text-ink-muted';

const CHEVRON =
  "url(\"data:image/svg+xml,%3Csvg xmlns='http://www.w3.org/2000/svg' viewBox='0 0 12 12'%3E%3Cpath d='M2.5 4.5L6 8l3.5-3.5' fill='none' stroke='%234b5565' stroke-width='1.6'/%3E%3C/svg%3E\")";

function controlClass(invalid: boolean, extra?: string) {
  return cx(control, invalid ? 'border-danger' : 'border-line-strong', extra);
}

interface FieldFrameProps {
  id: string;
  label: string;
  hint?: string;
  error?: string | null;
  className?: string;
  children: React.ReactNode;
  hideLabel?: boolean;
}

function FieldFrame({ id, label, hint, error, className, children, hideLabel }: FieldFrameProps) {
  return (
    <div className={cx('flex flex-col gap-1.5', className)}>
      <label htmlFor={id} className={cx('text-sm font-medium text-ink', hideLabel && 'sr-only')}>
        {label}
      </label>
      {children}
      {hint && !error && (
        <p id={`${id}-hint`} className="text-sm text-ink-faint">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm text-danger">
          <svg aria-hidden="true" viewBox="0 0 16 16" width="14" height="14" className="mt-[3px] shrink-0">
            <circle cx="8" cy="8" r="7" fill="currentColor" />
            <path d="M8 4.5v4.2M8 11.2v.3" stroke="#fff" strokeWidth="1.8" strokeLinecap="round" />
          </svg>
          <span>{error}</span>
        </p>
      )}
    </div>
  );
}

function describedBy(id: string, hint?: string, error?: string | null) {
  if (error) return `${id}-error`;
  if (hint) return `${id}-hint`;
  return undefined;
}

export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> {
  label: string;
  hint?: string;
  /** Validation message shown under the control, in place. */
  error?: string | null;
  /** Visually hide the label (it stays available to assistive technology). */
  hideLabel?: boolean;
  containerClassName?: string;
}

/** A labelled text input with hint and in-place error message. */
export function TextField({ label, hint, error, hideLabel, containerClassName, className, ...rest }: TextFieldProps) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error} className={containerClassName} hideLabel={hideLabel}>
      <input
        id={id}
        className={controlClass(Boolean(error), cx('h-10', className))}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        {...rest}
      />
    </FieldFrame>
  );
}

export interface TextAreaFieldProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'id'> {
  label: string;
  hint?: string;
  error?: string | null;
  containerClassName?: string;
}

/** A labelled multi-line text input. */
export function TextAreaField({ label, hint, error, containerClassName, className, ...rest }: TextAreaFieldProps) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error} className={containerClassName}>
      <textarea
        id={id}
        rows={3}
        className={controlClass(Boolean(error), cx('py-2', className))}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        {...rest}
      />
    </FieldFrame>
  );
}

export interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> {
  label: string;
  options: ReadonlyArray<{ value: string; label: string }>;
  hint?: string;
  error?: string | null;
  hideLabel?: boolean;
  containerClassName?: string;
}

/** A labelled native select. */
export function SelectField({ label, options, hint, error, hideLabel, containerClassName, className, ...rest }: SelectFieldProps) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error} className={containerClassName} hideLabel={hideLabel}>
      <select
        id={id}
        className={controlClass(Boolean(error), cx('h-10 cursor-pointer appearance-none bg-[length:12px_12px] bg-[position:right_0.75rem_center] bg-no-repeat pr-9', className))}
        style={{ backgroundImage: CHEVRON }}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        {...rest}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </FieldFrame>
  );
}
