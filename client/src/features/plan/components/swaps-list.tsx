import type { PlanSwap } from '../api/types';
import { formatGrams } from '../utils/format';
import { selectionOf } from '../utils/kit-selection';
import { ChooseKitButton } from './choose-kit-button';

export interface SwapsListProps {
  tripId: string;
  planId: string;
  swaps: readonly PlanSwap[];
  canChooseKit: boolean;
}

const counted = ({ name, count }: { name: string; count: number }) => (count > 1 ? `${count} × ${name}` : name);

/** The swap's change in a few words, for its button's accessible name. */
const changeWords = (swap: PlanSwap): string =>
  [
    swap.added.length ? `adds ${swap.added.map(counted).join(', ')}` : '',
    swap.removed.length ? `leaves ${swap.removed.map(counted).join(', ')} at home` : '',
  ]
    .filter(Boolean)
    .join('; ');

/** The next best kits, each with its grams against the optimum, what it changes and what it buys. */
export function SwapsList({ tripId, planId, swaps, canChooseKit }: SwapsListProps) {
  if (swaps.length === 0) return <p className="text-scree-700">No other kit from this gear comes close.</p>;
  return (
    <ol className="flex flex-col gap-3">
      {swaps.map((swap, i) => (
        <li key={i} className="flex flex-col gap-2 rounded-xl bg-white p-4 shadow-card">
          <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
            <p className="font-semibold text-scree-950 tabular-nums">
              {swap.extraG === 0 ? 'Same grams' : `${swap.extraG > 0 ? '+' : '−'}${formatGrams(Math.abs(swap.extraG))}`}
              <span className="font-normal text-scree-700"> · {formatGrams(swap.kit.massG)} in all</span>
            </p>
          </div>
          <p className="text-scree-900">{swap.text}</p>
          {canChooseKit && (
            <ChooseKitButton
              tripId={tripId}
              planId={planId}
              source="swap"
              selection={selectionOf(swap.kit)}
              description={changeWords(swap)}
            />
          )}
        </li>
      ))}
    </ol>
  );
}
