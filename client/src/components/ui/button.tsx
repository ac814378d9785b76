import type { ComponentProps } from 'react';
import { cn } from './cn';
import { Spinner } from './spinner';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'quiet';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-moss-700 text-white hover:bg-moss-800 active:bg-moss-900 border-moss-700',
  secondary: 'bg-white text-scree-900 border-scree-300 hover:border-scree-500 hover:bg-firn-100',
  danger: 'bg-rosehip-700 text-white border-rosehip-700 hover:bg-rosehip-800',
  quiet: 'bg-transparent text-scree-800 border-transparent hover:bg-firn-200',
};

const sizes = {
  sm: 'min-h-9 px-3 text-sm',
  md: 'min-h-11 px-4 text-base',
} as const;

export interface ButtonProps extends ComponentProps<'button'> {
  variant?: ButtonVariant;
  size?: keyof typeof sizes;
  /** Shows a spinner and blocks further clicks while an action runs. */
  isLoading?: boolean;
}

/** Class names of a button, for links that should look like one. */
export const buttonClasses = (variant: ButtonVariant = 'primary', size: keyof typeof sizes = 'md') =>
  cn(
    'inline-flex items-center justify-center gap-2 rounded-lg border-2 font-medium transition-colors',
    'disabled:cursor-not-allowed disabled:opacity-60',
    variants[variant],
    sizes[size],
  );

export function Button({
  variant = 'primary',
  size = 'md',
  isLoading = false,
  type = 'button',
  disabled,
  className,
  children,
  ...props
}: ButtonProps) {
  return (
    <button
      type={type}
      disabled={disabled || isLoading}
      aria-busy={isLoading || undefined}
      className={cn(buttonClasses(variant, size), className)}
      {...props}
    >
      {isLoading && <Spinner size="sm" label="Working" />}
      {children}
    </button>
  );
}
