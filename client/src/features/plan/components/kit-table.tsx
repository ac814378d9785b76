import type { ReactNode } from 'react';
import type { PlanKit } from '../api/types';
import { formatGrams, kindLabel } from '../utils/format';
import { GramMeter } from './gram-meter';

type Carrier = NonNullable<PlanKit['carriers']>[number];

const carrierGrams = (c: Carrier): string =>
  c.gramLimitG === null
    ? formatGrams(c.massG)
    : c.overG > 0
      ? `${formatGrams(c.massG)}, ${formatGrams(c.overG)} over their ${formatGrams(c.gramLimitG)} limit`
      : `${formatGrams(c.massG)} of their ${formatGrams(c.gramLimitG)} limit`;

/** A party's kit: who carries which lines, and their grams against their own limits. */
function CarriersSummary({ carriers }: { carriers: readonly Carrier[] }) {
  return (
    <div className="flex flex-col gap-1.5">
      <h3 className="text-sm font-semibold text-scree-900">Who carries what</h3>
      <ul className="flex flex-col gap-1 text-sm text-scree-800">
        {carriers.map((c) => (
          <li key={c.memberId}>
            <span className="font-medium text-scree-950">{c.name}</span>: {carrierGrams(c)}
            {c.lines.length > 0
              ? ` — ${c.lines.map((l) => (l.count > 1 ? `${l.count} × ${l.name}` : l.name)).join(', ')}`
              : ' — nothing'}
          </li>
        ))}
      </ul>
    </div>
  );
}

export interface KitTableProps {
  kit: PlanKit;
  caption: string;
  /** Item ids no charging path uses, marked so the member can question them. */
  unusedItemIds?: readonly string[];
  /** Buttons under the table ("Use this kit"). */
  actions?: ReactNode;
}

/** A kit: what to take, how many, and the grams of each line and of the whole against the limit. */
export function KitTable({ kit, caption, unusedItemIds = [], actions }: KitTableProps) {
  return (
    <div className="flex flex-col gap-3">
      <div role="region" aria-label={`${caption} (scrolls sideways)`} tabIndex={0} className="overflow-x-auto">
        <table className="w-full text-left text-sm sm:text-base">
          <caption className="sr-only">{caption}</caption>
          <thead className="border-b-2 border-scree-200 text-sm text-scree-600">
            <tr>
              <th scope="col" className="py-2 pr-3 font-medium">
                Item
              </th>
              <th scope="col" className="py-2 pr-3 font-medium">
                Kind
              </th>
              <th scope="col" className="py-2 pr-3 text-right font-medium">
                Count
              </th>
              <th scope="col" className="py-2 text-right font-medium">
                Grams
              </th>
            </tr>
          </thead>
          <tbody>
            {kit.lines.map((line) => (
              <tr key={line.itemId} className="border-b border-firn-200 align-top">
                <th scope="row" className="py-2 pr-3 font-medium text-scree-950">
                  {line.name}
                  {unusedItemIds.includes(line.itemId) && (
                    <span className="block text-sm font-normal text-scree-600">No charging path uses it</span>
                  )}
                </th>
                <td className="py-2 pr-3 text-scree-700">{kindLabel(line.kind)}</td>
                <td className="py-2 pr-3 text-right tabular-nums">× {line.count}</td>
                <td className="py-2 text-right whitespace-nowrap tabular-nums">
                  {formatGrams(line.massG)}
                  {line.count > 1 && (
                    <span className="block text-xs text-scree-600">{formatGrams(line.unitMassG)} each</span>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr className="font-semibold text-scree-950">
              <th scope="row" colSpan={3} className="py-2 pr-3">
                Power gear in all
              </th>
              <td className="py-2 text-right whitespace-nowrap tabular-nums">{formatGrams(kit.massG)}</td>
            </tr>
          </tfoot>
        </table>
      </div>
      <GramMeter kit={kit} />
      {kit.carriers && kit.carriers.length > 0 && <CarriersSummary carriers={kit.carriers} />}
      {actions}
    </div>
  );
}
