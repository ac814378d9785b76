import { useId } from 'react';
import type { KitEvaluation } from '../api/types';
import { DayStrip } from './day-strip';

/** The day strip under its heading; the plan and try-a-kit show it the same way. */
export function DayStripSection({ evaluation }: { evaluation: Pick<KitEvaluation, 'dayStrip' | 'bindingSkyId'> }) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-3">
      <h2 id={headingId} className="text-lg font-semibold text-scree-950">
        Day by day
      </h2>
      <DayStrip cells={evaluation.dayStrip} skyId={evaluation.bindingSkyId} aria-labelledby={headingId} />
    </section>
  );
}
