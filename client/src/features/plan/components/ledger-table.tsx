import { useId, useState } from 'react';
import { Select } from '@/components/ui/select';
import type { DesignSkyId, KitEvaluation, LedgerDay } from '../api/types';
import { dayLabel, formatHours, formatWh, skyLabels } from '../utils/format';

/** What the kit loses on the way: charging and output losses of the stores, the converters and the devices. */
const lossesWh = (day: LedgerDay): number =>
  day.storeChargeLossWh + day.storeOutputLossWh + day.converterLossWh + day.deviceChargeLossWh;

const columns: ReadonlyArray<{ label: string; hint?: string; value: (day: LedgerDay) => string }> = [
  { label: 'Harvest', hint: 'into the stores', value: (d) => formatWh(d.harvestWh) },
  { label: 'Spilled', hint: 'stores full', value: (d) => formatWh(d.spilledWh) },
  { label: 'Delivered', hint: 'to devices', value: (d) => formatWh(d.deliveredWh) },
  { label: 'Losses', hint: 'on the way', value: (d) => formatWh(lossesWh(d)) },
  { label: 'Short', hint: 'not delivered', value: (d) => formatWh(d.unmetWh) },
  { label: 'Frozen', hint: 'no charging', value: (d) => formatHours(d.frozenHours) },
  { label: 'Stored', hint: 'day start', value: (d) => formatWh(d.storedStartWh) },
  { label: 'Stored', hint: 'day end', value: (d) => formatWh(d.storedEndWh) },
];

/**
 * The ledger: one row per trip day, energy in Wh. When the plan shows two skies (the binding one and the expected
 * one) a select switches between them; the table scrolls inside its own region on a phone.
 */
export function LedgerTable({ ledgers, bindingSkyId }: Pick<KitEvaluation, 'ledgers' | 'bindingSkyId'>) {
  const selectId = useId();
  const [skyId, setSkyId] = useState<DesignSkyId>(bindingSkyId);
  const ledger = ledgers.find((l) => l.skyId === skyId) ?? ledgers[0];
  if (!ledger) return <p className="text-scree-700">No ledger for this kit.</p>;
  const caption = `Ledger, ${skyLabels[ledger.skyId].toLowerCase()}`;
  return (
    <div className="flex flex-col gap-3">
      {ledgers.length > 1 && (
        <div className="flex flex-wrap items-center gap-2">
          <label htmlFor={selectId} className="text-sm font-medium text-scree-900">
            Sky
          </label>
          <Select
            id={selectId}
            value={ledger.skyId}
            onValueChange={setSkyId}
            options={ledgers.map((l) => ({
              value: l.skyId,
              label: `${skyLabels[l.skyId]}${l.skyId === bindingSkyId ? ' (the tightest)' : ''}`,
            }))}
          />
        </div>
      )}
      <div
        role="region"
        aria-label={`${caption} (scrolls sideways)`}
        tabIndex={0}
        className="overflow-x-auto rounded-lg border-2 border-firn-200 bg-white"
      >
        <table className="w-full text-right text-sm whitespace-nowrap tabular-nums">
          <caption className="sr-only">{caption}, in Wh and hours</caption>
          <thead className="bg-firn-100 text-scree-700">
            <tr>
              <th scope="col" className="px-3 py-2 text-left font-medium">
                Day
              </th>
              {columns.map((c, i) => (
                <th key={i} scope="col" className="px-3 py-2 font-medium">
                  {c.label}
                  {c.hint && <span className="block text-xs font-normal text-scree-600">{c.hint}</span>}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {ledger.days.map((day) => (
              <tr key={day.dayIndex} className="border-t border-firn-200">
                <th scope="row" className="px-3 py-2 text-left font-medium text-scree-950">
                  {dayLabel(day.dayIndex)}
                </th>
                {columns.map((c, i) => (
                  <td
                    key={i}
                    className={
                      day.unmetWh > 0 && c.label === 'Short'
                        ? 'px-3 py-2 font-semibold text-rosehip-800'
                        : 'px-3 py-2 text-scree-900'
                    }
                  >
                    {c.value(day)}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
