import type { ComponentProps } from 'react';
import { cn } from './cn';

export interface SelectOption<T extends string> {
  value: T;
  label: string;
}

export interface SelectProps<T extends string> extends Omit<ComponentProps<'select'>, 'value' | 'onChange'> {
  options: readonly SelectOption<T>[];
  value: T;
  onValueChange: (value: T) => void;
}

/** A native select (best on phones and with screen readers), styled to match the text fields. Label it with `aria-label` or a `<label>`. */
export function Select<T extends string>({ options, value, onValueChange, className, ...props }: SelectProps<T>) {
  return (
    <select
      value={value}
      onChange={(event) => onValueChange(event.target.value as T)}
      className={cn(
        'min-h-10 rounded-lg border-2 border-scree-300 bg-white px-2 text-base text-scree-950',
        'hover:border-scree-500 disabled:opacity-60',
        className,
      )}
      {...props}
    >
      {options.map((option) => (
        <option key={option.value} value={option.value}>
          {option.label}
        </option>
      ))}
    </select>
  );
}
