import { connectors } from '@gramwatt/shared';
import { useId, type ReactNode } from 'react';
import { get, useFormContext, useFormState, useWatch, type FieldError, type Path } from 'react-hook-form';
import { TextField } from '@/components/ui/text-field';
import { cn } from '@/components/ui/cn';
import type { ItemFormValues } from '../utils/item-form-values';
import { connectorLabels } from '../utils/labels';

export type FieldName = Path<ItemFormValues>;

/** The first message in an error subtree (a list field such as USB PD voltages may hold one per entry). */
const firstMessage = (error: unknown): string | undefined => {
  if (!error || typeof error !== 'object') return undefined;
  if (typeof (error as FieldError).message === 'string' && (error as FieldError).message)
    return (error as FieldError).message;
  for (const value of Object.values(error as Record<string, unknown>)) {
    if (value && typeof value === 'object' && !(value instanceof Element)) {
      const message = firstMessage(value);
      if (message) return message;
    }
  }
  return undefined;
};

/**
 * The message shown under a field. The shared schema speaks the API's language; on screen an empty field is
 * "required" rather than "must be a number", and a share field reads in percent.
 */
export const fieldMessage = (error: unknown, value: unknown, { percent = false } = {}): string | undefined => {
  const message = firstMessage(error);
  if (!message) return undefined;
  const isEmpty = value === undefined || (typeof value === 'string' && value.trim() === '');
  if (isEmpty && / must be a number$/.test(message)) return message.replace(/ must be a number$/, ' is required');
  if (percent) {
    const subject = /^(.*?) (?:is a share from 0 to 1|must be above 0$)/.exec(message)?.[1];
    if (subject) return `${subject} is a percentage above 0 and at most 100`;
  }
  return message;
};

export function useFieldError(name: FieldName, options?: { percent?: boolean }): string | undefined {
  const { control } = useFormContext<ItemFormValues>();
  const { errors } = useFormState({ control, name });
  const value = useWatch({ control, name });
  return fieldMessage(get(errors, name), value, options);
}

export interface NumberFieldProps {
  name: FieldName;
  label: string;
  unit: string;
  hint?: ReactNode;
  required?: boolean;
  /** The field holds a percent on screen and a share in the API. */
  percent?: boolean;
  className?: string;
}

/** A number typed as text (a decimal comma is fine), labelled with its unit. */
export function NumberField({ name, label, unit, hint, required, percent, className }: NumberFieldProps) {
  const { register } = useFormContext<ItemFormValues>();
  const error = useFieldError(name, { percent });
  return (
    <TextField
      label={label}
      unit={unit}
      hint={hint}
      required={required}
      inputMode="decimal"
      autoComplete="off"
      error={error}
      className={className}
      {...register(name)}
    />
  );
}

export interface SelectFieldProps {
  name: FieldName;
  label: string;
  options: ReadonlyArray<{ value: string; label: string }>;
  hint?: ReactNode;
  className?: string;
}

/** A native select registered with the form, styled like the text fields. */
export function SelectField({ name, label, options, hint, className }: SelectFieldProps) {
  const { register } = useFormContext<ItemFormValues>();
  const error = useFieldError(name);
  const id = useId();
  const describedBy = [hint && `${id}-hint`, error && `${id}-error`].filter(Boolean).join(' ') || undefined;
  return (
    <div className={cn('flex flex-col gap-1.5', className)}>
      <label htmlFor={id} className="text-sm font-medium text-scree-900">
        {label}
      </label>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={cn(
          'min-h-11 rounded-lg border-2 bg-white px-2 text-base text-scree-950 focus:border-tarn-600 focus:outline-none',
          error ? 'border-rosehip-600' : 'border-scree-300 hover:border-scree-500',
        )}
        {...register(name)}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-scree-600">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="text-sm font-medium text-rosehip-700">
          {error}
        </p>
      )}
    </div>
  );
}

export function CheckboxField({ name, label, hint }: { name: FieldName; label: string; hint?: ReactNode }) {
  const { register } = useFormContext<ItemFormValues>();
  const id = useId();
  return (
    <div className="flex items-start gap-3">
      <input
        id={id}
        type="checkbox"
        aria-describedby={hint ? `${id}-hint` : undefined}
        className="mt-0.5 size-5 shrink-0 rounded border-2 border-scree-400 accent-moss-700"
        {...register(name)}
      />
      <div>
        <label htmlFor={id} className="text-sm font-medium text-scree-900">
          {label}
        </label>
        {hint && (
          <p id={`${id}-hint`} className="text-sm text-scree-600">
            {hint}
          </p>
        )}
      </div>
    </div>
  );
}

export const connectorOptions = connectors.map((connector) => ({
  value: connector,
  label: connectorLabels[connector],
}));

/** A group of fields under a small heading. */
export function FieldGroup({ legend, children, hint }: { legend: string; children: ReactNode; hint?: ReactNode }) {
  return (
    <fieldset className="flex flex-col gap-4 border-t-2 border-firn-200 pt-4">
      <legend className="float-left mb-1 w-full text-sm font-semibold tracking-wide text-scree-700 uppercase">
        {legend}
      </legend>
      {hint && <p className="-mt-2 text-sm text-scree-600">{hint}</p>}
      {children}
    </fieldset>
  );
}

/** A port: its connector and whether a cable is fixed to it. */
export function PortFields({
  name,
  legend,
}: {
  name: 'spec.outputPort' | 'spec.inputPort' | 'spec.chargePort' | 'spec.port';
  legend: string;
}) {
  return (
    <FieldGroup legend={legend}>
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField name={`${name}.connector`} label={`${legend}: connector`} options={connectorOptions} />
        <div className="sm:pt-8">
          <CheckboxField
            name={`${name}.captiveCable`}
            label="Captive cable"
            hint="A cable is fixed to the port; the connector is the plug at its free end."
          />
        </div>
      </div>
    </FieldGroup>
  );
}

/** Two or three fields side by side on wide screens. */
export function FieldRow({ children }: { children: ReactNode }) {
  return <div className="grid gap-4 sm:grid-cols-2">{children}</div>;
}
