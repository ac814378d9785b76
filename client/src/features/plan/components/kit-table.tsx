import type { ReactNode } from 'react';
import type { PlanKit } from '../api/types';
import { formatGrams, kindLabel } from '../utils/format';
import { GramMeter } from './gram-meter';

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
      {actions}
    </div>
  );
}
