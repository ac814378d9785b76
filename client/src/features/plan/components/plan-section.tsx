import { useId, type ReactNode } from 'react';
import { cn } from '@/components/ui/cn';

export interface PlanSectionProps {
  title: string;
  /** One line under the heading. */
  intro?: ReactNode;
  children: ReactNode;
  className?: string;
}

/** A titled part of a plan tab: a landmark a screen-reader user can jump to by its heading. */
export function PlanSection({ title, intro, children, className }: PlanSectionProps) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className={cn('flex min-w-0 flex-col gap-3', className)}>
      <div>
        <h2 id={headingId} className="text-lg font-semibold text-scree-950">
          {title}
        </h2>
        {intro && <p className="mt-0.5 text-sm text-scree-700">{intro}</p>}
      </div>
      {children}
    </section>
  );
}
