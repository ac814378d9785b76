import type { PlanKit } from '../api/types';
import { formatGrams } from '../utils/format';

/** The kit's grams against the gram limit in words, with a bar that hatches the grams over it. */
export function GramMeter({ kit }: { kit: Pick<PlanKit, 'massG' | 'gramLimitG' | 'overLimitG'> }) {
  const { massG, gramLimitG, overLimitG } = kit;
  if (gramLimitG === null)
    return <p className="text-scree-800">{formatGrams(massG)} of power gear; this trip has no gram limit.</p>;
  const scaleG = Math.max(massG, gramLimitG);
  const withinG = Math.min(massG, gramLimitG);
  return (
    <div className="flex flex-col gap-1.5">
      <p className="text-scree-800">
        {overLimitG !== null ? (
          <>
            <strong className="font-semibold text-scree-950">{formatGrams(massG)}</strong>: {formatGrams(overLimitG)}{' '}
            over the {formatGrams(gramLimitG)} limit.
          </>
        ) : (
          <>
            <strong className="font-semibold text-scree-950">{formatGrams(massG)}</strong> of the{' '}
            {formatGrams(gramLimitG)} limit — {formatGrams(gramLimitG - massG)} to spare.
          </>
        )}
      </p>
      <div aria-hidden="true" className="relative h-3 w-full overflow-hidden rounded-full bg-firn-200">
        <div className="absolute inset-y-0 left-0 bg-scree-700" style={{ width: `${(withinG / scaleG) * 100}%` }} />
        {overLimitG !== null && (
          <div
            className="absolute inset-y-0 bg-rosehip-50 bg-dry-hatch text-rosehip-700"
            style={{ left: `${(gramLimitG / scaleG) * 100}%`, width: `${(overLimitG / scaleG) * 100}%` }}
          />
        )}
        {/* The limit as a tick, where the bar would stop. */}
        <div
          className="absolute inset-y-0 w-0.5 bg-scree-950"
          style={{ left: `calc(${(gramLimitG / scaleG) * 100}% - 1px)` }}
        />
      </div>
    </div>
  );
}
