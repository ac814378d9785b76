import type { ReactNode } from 'react';

export interface EmptyStateProps {
  title: string;
  children?: ReactNode;
  /** A decorative picture; hidden from screen readers. */
  illustration?: ReactNode;
  action?: ReactNode;
}

/** Says plainly that there is nothing here yet, and why. */
export function EmptyState({ title, children, illustration, action }: EmptyStateProps) {
  return (
    <section
      aria-label={title}
      className="flex flex-col items-center rounded-xl border-2 border-dashed border-scree-300 bg-white/70 px-6 py-12 text-center"
    >
      {illustration && (
        <div aria-hidden="true" className="mb-5 text-moss-700">
          {illustration}
        </div>
      )}
      <h2 className="text-lg font-semibold text-scree-900">{title}</h2>
      {children && <div className="mt-2 max-w-prose text-scree-700">{children}</div>}
      {action && <div className="mt-6">{action}</div>}
    </section>
  );
}
