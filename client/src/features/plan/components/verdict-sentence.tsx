import type { PlanVerdict } from '../api/types';

/** A dry day of the strip in small: the hatch beside a verdict that runs dry, so the two read together. */
function DryMark() {
  return (
    <span
      aria-hidden="true"
      className="mt-1.5 inline-block size-4 shrink-0 rounded-sm border-2 border-larch-600 bg-larch-50 bg-dry-hatch text-larch-500"
    />
  );
}

/** The verdict as a plain sentence, in the body colour: what a kit does, never a coloured light. */
export function VerdictSentence({ verdict, size = 'lg' }: { verdict: PlanVerdict; size?: 'lg' | 'md' }) {
  return (
    <p
      className={
        size === 'lg'
          ? 'flex gap-2 text-lg font-medium text-scree-950 sm:text-xl'
          : 'flex gap-2 text-base font-medium text-scree-950'
      }
    >
      {verdict.status === 'runs-dry' && <DryMark />}
      <span>{verdict.text}</span>
    </p>
  );
}
