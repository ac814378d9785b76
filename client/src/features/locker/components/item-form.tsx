import { zodResolver } from '@hookform/resolvers/zod';
import type { ItemKind } from '@gramwatt/shared';
import { itemKinds } from '../utils/item-kinds';
import { useState, type ReactNode } from 'react';
import { FormProvider, get, useForm, type Path, type Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { cn } from '@/components/ui/cn';
import { isApiError } from '@/lib/api-client';
import { emptyItemFormValues, itemFormSchema, type ItemFormValues } from '../utils/item-form-values';
import { kindLabels } from '../utils/labels';
import {
  BankFields,
  BatteryFields,
  ControllerFields,
  ConverterFields,
  DeviceFields,
  LeadFields,
  PanelFields,
} from './kind-fields';

const kindFields: Record<ItemKind, () => ReactNode> = {
  panel: PanelFields,
  bank: BankFields,
  battery: BatteryFields,
  converter: ConverterFields,
  controller: ControllerFields,
  lead: LeadFields,
  device: DeviceFields,
};

/** A server error path as a form field: list-entry paths (`…usbPdVolts.1`) belong to the list's field. */
const fieldForPath = (values: ItemFormValues, path: string): Path<ItemFormValues> | null => {
  let candidate = path;
  for (;;) {
    const value: unknown = get(values, candidate);
    if (value !== undefined && (typeof value !== 'object' || Array.isArray(value)))
      return candidate as Path<ItemFormValues>;
    const shorter = candidate.replace(/\.\d+$/, '');
    if (shorter === candidate) return null;
    candidate = shorter;
  }
};

export interface ItemFormProps<Body> {
  /** The values to start from: an existing item's, or `emptyItemFormValues(kind)`. */
  initialValues: ItemFormValues;
  /** New items may change kind; an existing item keeps its kind. */
  kindLocked: boolean;
  /** Locker items have a count; catalogue entries do not. */
  showCount: boolean;
  /** The API body schema (the server checks the same one). */
  bodySchema: z.ZodType<Body>;
  submitLabel: string;
  /** Sends the body; a thrown 400 ApiError's field errors are put onto the fields. */
  onSubmit: (body: Body) => Promise<unknown>;
  onCancel: () => void;
  /** Extra content after the fields (files of a saved item). */
  children?: ReactNode;
}

/**
 * The add/edit form for one item of any kind: the shared fields, then the kind's own fields. Validates with the
 * shared schema in the browser, and maps a server 400's field paths onto the same fields.
 */
export function ItemForm<Body>({
  initialValues,
  kindLocked,
  showCount,
  bodySchema,
  submitLabel,
  onSubmit,
  onCancel,
  children,
}: ItemFormProps<Body>) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<ItemFormValues, unknown, Body>({
    resolver: zodResolver(itemFormSchema(bodySchema)) as unknown as Resolver<ItemFormValues, unknown, Body>,
    defaultValues: initialValues,
  });
  const { register, handleSubmit, setError, getValues, reset, formState } = form;
  const kind = form.watch('spec.kind');
  const Fields = kindFields[kind];

  const submit = handleSubmit(async (body) => {
    setFormError(null);
    try {
      await onSubmit(body);
    } catch (error) {
      if (!isApiError(error)) {
        setFormError('Something went wrong. Try again.');
        return;
      }
      const values = getValues();
      const unplaced: string[] = [];
      let focused = false;
      for (const fieldError of error.errors) {
        const field = fieldForPath(values, fieldError.path);
        if (field) {
          setError(field, { type: 'server', message: fieldError.message }, { shouldFocus: !focused });
          focused = true;
        } else unplaced.push(fieldError.path ? `${fieldError.path}: ${fieldError.message}` : fieldError.message);
      }
      setFormError(unplaced.length > 0 ? `${error.message} — ${unplaced.join('; ')}` : focused ? null : error.message);
    }
  });

  const changeKind = (next: ItemKind) => {
    const { name, notes, countOwned } = getValues();
    reset({ ...emptyItemFormValues(next), name, notes, countOwned });
  };

  return (
    <FormProvider {...form}>
      <form onSubmit={submit} noValidate className="flex flex-col gap-5">
        {formError && (
          <Alert tone="error" title="Could not save">
            {formError}
          </Alert>
        )}
        {!kindLocked && (
          <div className="flex flex-col gap-1.5">
            <span id="item-kind-label" className="text-sm font-medium text-scree-900">
              Kind
            </span>
            <div role="radiogroup" aria-labelledby="item-kind-label" className="flex flex-wrap gap-2">
              {itemKinds.map((option) => (
                <label
                  key={option}
                  className={cn(
                    'flex min-h-10 cursor-pointer items-center rounded-lg border-2 px-3 text-sm font-medium',
                    'has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-tarn-600',
                    option === kind
                      ? 'border-moss-700 bg-moss-50 text-moss-900'
                      : 'border-scree-300 bg-white text-scree-800 hover:border-scree-500',
                  )}
                >
                  <input
                    type="radio"
                    name="item-kind"
                    value={option}
                    checked={option === kind}
                    onChange={() => changeKind(option)}
                    className="sr-only"
                  />
                  {kindLabels[option]}
                </label>
              ))}
            </div>
          </div>
        )}
        <TextField
          label="Name"
          required
          autoComplete="off"
          error={formState.errors.name?.message}
          {...register('name')}
        />
        {showCount && (
          <TextField
            label="Count owned"
            unit="pcs"
            inputMode="numeric"
            required
            className="max-w-48"
            error={formState.errors.countOwned?.message}
            {...register('countOwned')}
          />
        )}
        <Fields />
        <div className="flex flex-col gap-1.5 border-t-2 border-firn-200 pt-4">
          <label htmlFor="item-notes" className="text-sm font-medium text-scree-900">
            Notes
          </label>
          <textarea
            id="item-notes"
            rows={3}
            className="rounded-lg border-2 border-scree-300 bg-white px-3 py-2 text-base text-scree-950 focus:border-tarn-600 focus:outline-none"
            {...register('notes')}
          />
        </div>
        {children}
        <div className="sticky bottom-0 -mx-6 flex flex-col-reverse gap-2 border-t-2 border-firn-200 bg-white px-6 py-4 sm:flex-row sm:justify-end">
          <Button variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
          <Button type="submit" isLoading={formState.isSubmitting}>
            {submitLabel}
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
