import { useId, type ComponentProps, type ReactNode } from 'react';
import { cn } from './cn';

export interface TextFieldProps extends Omit<ComponentProps<'input'>, 'id'> {
  label: ReactNode;
  /** A short help line under the field. */
  hint?: ReactNode;
  /** The field's unit, shown at its end and read with the label (e.g. `Wh`, `g`). */
  unit?: string;
  /** The problem with the current value, shown under the field and linked to it for screen readers. */
  error?: string;
  id?: string;
}

export function TextField({ label, hint, unit, error, id, className, required, ...props }: TextFieldProps) {
  const generatedId = useId();
  const inputId = id ?? generatedId;
  const hintId = `${inputId}-hint`;
  const errorId = `${inputId}-error`;
  const unitId = `${inputId}-unit`;
  const describedBy = [unit && unitId, hint && hintId, error && errorId].filter(Boolean).join(' ') || undefined;

  return (
    <div className={cn('flex flex-col gap-1.5', className)}>
      <label htmlFor={inputId} className="text-sm font-medium text-scree-900">
        {label}
        {required && (
          <span aria-hidden="true" className="text-scree-600">
            {' '}
            (required)
          </span>
        )}
      </label>
      <div
        className={cn(
          'flex items-stretch overflow-hidden rounded-lg border-2 bg-white transition-colors',
          'focus-within:border-tarn-600',
          error ? 'border-rosehip-600' : 'border-scree-300',
        )}
      >
        <input
          id={inputId}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          required={required}
          className="min-h-11 w-full min-w-0 bg-transparent px-3 text-base text-scree-950 placeholder:text-scree-500 focus:outline-none"
          {...props}
        />
        {unit && (
          <span
            id={unitId}
            className="flex items-center border-l-2 border-scree-200 bg-firn-100 px-3 text-sm font-medium text-scree-700"
          >
            {unit}
          </span>
        )}
      </div>
      {hint && (
        <p id={hintId} className="text-sm text-scree-600">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-medium text-rosehip-700">
          <svg viewBox="0 0 16 16" className="mt-0.5 size-4 shrink-0" aria-hidden="true">
            <path d="M8 1.5 15 14H1z" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinejoin="round" />
            <path d="M8 6v3.5M8 11.5v.5" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
          </svg>
          <span>{error}</span>
        </p>
      )}
    </div>
  );
}
