import type { CheckResult } from '../api/types';
import { formatGrams } from '../utils/format';

type Shave = CheckResult['shaves'][number];

export interface ShavesListProps {
  shaves: readonly Shave[];
  /** Changes the check had no time to try (the biggest savings are tried first). */
  untriedChanges?: number;
  /** Applies a shave to the kit being tried. */
  onApply: (change: Shave['change']) => void;
}

/** Changes that shave grams from a hand-picked kit and still keep every device charged, lightest first. */
export function ShavesList({ shaves, untriedChanges = 0, onApply }: ShavesListProps) {
  return (
    <div className="flex flex-col gap-2">
      {shaves.length === 0 ? (
        <p className="text-scree-700">
          {untriedChanges > 0
            ? 'No change tried in time keeps every device charged.'
            : 'Nothing can come out of this kit without a device going short.'}
        </p>
      ) : (
        <ul className="flex flex-col gap-2">
          {shaves.map((shave) => (
            <li
              key={JSON.stringify(shave.change)}
              className="flex flex-wrap items-center justify-between gap-2 rounded-lg bg-white px-3 py-2 shadow-card"
            >
              <p className="min-w-0 flex-1 text-scree-900">
                {shave.text}{' '}
                <span className="text-sm whitespace-nowrap text-scree-600">({formatGrams(shave.massG)} in all)</span>
              </p>
              <button
                type="button"
                onClick={() => onApply(shave.change)}
                aria-label={`Try it: ${shave.text}`}
                className="min-h-9 rounded-lg border-2 border-scree-300 px-3 text-sm font-medium hover:border-scree-500"
              >
                Try it
              </button>
            </li>
          ))}
        </ul>
      )}
      {untriedChanges > 0 && (
        <p className="text-sm text-scree-700">
          The planner ran out of time: {untriedChanges.toLocaleString('en-GB')}{' '}
          {untriedChanges === 1 ? 'change was' : 'changes were'} not tried (it tries the biggest savings first). Pick
          fewer items to see them all.
        </p>
      )}
    </div>
  );
}
