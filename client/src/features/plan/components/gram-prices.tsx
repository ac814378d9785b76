import type { PlanGramPrice } from '../api/types';

/** What each extra requirement would cost in grams, in the planner's own plain sentences. */
export function GramPrices({ prices }: { prices: readonly PlanGramPrice[] }) {
  if (prices.length === 0) return <p className="text-scree-700">No gram prices for this plan.</p>;
  return (
    <ul className="flex flex-col gap-2">
      {prices.map((price) => (
        <li key={price.requirement} className="rounded-lg bg-white px-3 py-2 text-scree-900 shadow-card">
          {price.text}
        </li>
      ))}
    </ul>
  );
}
