/** Cells of the little strip that fills while the planner works: a nod to the day strip, not a measure. */
const progressCells = 7;

/**
 * Shown once a solve takes longer than a moment: an indeterminate progress bar (the planner cannot say how far it
 * is) with the seconds so far, which screen readers read as its value.
 */
export function SolveProgress({ seconds }: { seconds: number }) {
  return (
    <div className="flex flex-wrap items-center gap-3 rounded-lg bg-white px-4 py-3 shadow-card">
      <div
        role="progressbar"
        aria-label="Finding the lightest kit"
        aria-valuetext={`${seconds} s so far`}
        className="flex h-6 w-32 gap-1"
      >
        {Array.from({ length: progressCells }, (_, i) => (
          <span
            key={i}
            aria-hidden="true"
            className="flex-1 animate-pulse rounded-sm bg-moss-500 motion-reduce:animate-none"
            style={{ animationDelay: `${i * 140}ms` }}
          />
        ))}
      </div>
      <p className="text-scree-800">
        Weighing kits from the trip’s gear against every design sky… <span className="tabular-nums">{seconds} s</span>
      </p>
    </div>
  );
}
