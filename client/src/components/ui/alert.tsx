import type { ReactNode } from 'react';
import { cn } from './cn';

export type AlertTone = 'error' | 'caution' | 'info' | 'done';

const tones: Record<AlertTone, string> = {
  error: 'border-rosehip-600 bg-rosehip-50 text-rosehip-900',
  caution: 'border-larch-500 bg-larch-50 text-larch-900',
  info: 'border-tarn-500 bg-tarn-50 text-tarn-900',
  done: 'border-moss-600 bg-moss-50 text-moss-900',
};

export interface AlertProps {
  tone?: AlertTone;
  /** A few words naming the situation; the tone is never carried by colour alone. */
  title?: ReactNode;
  children?: ReactNode;
  className?: string;
}

/** A message in the page flow. Errors are announced at once (`role="alert"`), the rest politely (`role="status"`). */
export function Alert({ tone = 'info', title, children, className }: AlertProps) {
  return (
    <div
      role={tone === 'error' ? 'alert' : 'status'}
      className={cn('rounded-lg border-l-4 px-4 py-3 text-sm', tones[tone], className)}
    >
      {title && <p className="font-semibold">{title}</p>}
      {children && <div className={title ? 'mt-1' : undefined}>{children}</div>}
    </div>
  );
}
