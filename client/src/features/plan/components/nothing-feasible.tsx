import type { PlanResult } from '../api/types';
import { dayLabel, formatWh, skyLabels } from '../utils/format';

type NothingFeasible = NonNullable<PlanResult['nothingFeasible']>;

const skyWords = (skyId: string) => (skyId in skyLabels ? skyLabels[skyId as keyof typeof skyLabels] : skyId);

/** When no kit from the gear works: what is missing and where the energy runs short, in sentences. */
export function NothingFeasible({ answer }: { answer: NothingFeasible }) {
  return (
    <div className="flex flex-col gap-3">
      <ul className="flex list-disc flex-col gap-1.5 pl-5 text-scree-900">
        {answer.missing.map((sentence) => (
          <li key={sentence}>{sentence}</li>
        ))}
      </ul>
      {answer.shortfalls.length > 0 && (
        <div role="region" aria-label="Shortfalls (scrolls sideways)" tabIndex={0} className="overflow-x-auto">
          <table className="text-left text-sm">
            <caption className="mb-1 text-left font-medium text-scree-900">
              Where the energy runs short with everything packed
            </caption>
            <thead className="text-scree-600">
              <tr>
                <th scope="col" className="py-1 pr-4 font-medium">
                  Day
                </th>
                <th scope="col" className="py-1 pr-4 font-medium">
                  Sky
                </th>
                <th scope="col" className="py-1 text-right font-medium">
                  Short by
                </th>
              </tr>
            </thead>
            <tbody>
              {answer.shortfalls.map((s) => (
                <tr key={`${s.skyId}-${s.dayIndex}`} className="border-t border-firn-200">
                  <td className="py-1 pr-4">{dayLabel(s.dayIndex)}</td>
                  <td className="py-1 pr-4">{skyWords(s.skyId)}</td>
                  <td className="py-1 text-right tabular-nums">{formatWh(s.shortWh)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <p className="text-scree-700">
        Add what is missing to your locker (or lend it from a partner), or ask less of the devices, and find the
        lightest kit again.
      </p>
    </div>
  );
}
