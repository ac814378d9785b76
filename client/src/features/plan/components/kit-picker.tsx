import { useId } from 'react';
import type { PickableGear } from '../api/get-trip-gear';
import { formatGrams } from '../utils/format';

/** The power roles of gear, in the order energy flows; devices are carried anyway and are not picked. */
const roles: ReadonlyArray<{ label: string; kinds: readonly string[] }> = [
  { label: 'Collect', kinds: ['panel'] },
  { label: 'Store', kinds: ['bank', 'battery'] },
  { label: 'Convert', kinds: ['converter', 'controller'] },
  { label: 'Connect', kinds: ['lead'] },
];

export interface KitPickerProps {
  gear: readonly PickableGear[];
  counts: Readonly<Record<string, number>>;
  onCountChange: (itemId: string, count: number) => void;
}

function Stepper({
  item,
  count,
  onCountChange,
}: {
  item: PickableGear;
  count: number;
  onCountChange: (itemId: string, count: number) => void;
}) {
  const inputId = useId();
  const set = (next: number) => onCountChange(item.itemId, Math.max(0, Math.min(item.maxCount, Math.round(next))));
  const stepClasses =
    'flex size-11 items-center justify-center rounded-lg border-2 border-scree-300 bg-white text-xl font-semibold text-scree-900 hover:border-scree-500 disabled:cursor-not-allowed disabled:opacity-40';
  return (
    <li className="flex items-center justify-between gap-3 py-2">
      <div className="min-w-0">
        <label htmlFor={inputId} className="block font-medium text-scree-950">
          {item.name}
        </label>
        <p className="text-sm text-scree-600">
          {formatGrams(item.massG)} each · up to {item.maxCount}
          {item.ownerName && ` · ${item.ownerName}’s`}
        </p>
      </div>
      <div className="flex shrink-0 items-center gap-1.5">
        <button
          type="button"
          className={stepClasses}
          aria-label={`One fewer ${item.name}`}
          disabled={count <= 0}
          onClick={() => set(count - 1)}
        >
          −
        </button>
        <input
          id={inputId}
          type="number"
          inputMode="numeric"
          min={0}
          max={item.maxCount}
          value={count}
          onChange={(e) => set(Number(e.target.value) || 0)}
          aria-describedby={`${inputId}-owned`}
          className="h-11 w-12 rounded-lg border-2 border-scree-300 bg-white text-center text-base tabular-nums"
        />
        <span id={`${inputId}-owned`} className="sr-only">
          how many to take, up to {item.maxCount}
        </span>
        <button
          type="button"
          className={stepClasses}
          aria-label={`One more ${item.name}`}
          disabled={count >= item.maxCount}
          onClick={() => set(count + 1)}
        >
          +
        </button>
      </div>
    </li>
  );
}

/** The trip's power gear by role, each with a stepper bounded by the units that may go. */
export function KitPicker({ gear, counts, onCountChange }: KitPickerProps) {
  const groups = roles
    .map((role) => ({ ...role, items: gear.filter((item) => role.kinds.includes(item.kind)) }))
    .filter((group) => group.items.length > 0);
  return (
    <div className="flex flex-col gap-4">
      {groups.map((group) => (
        <fieldset key={group.label} className="min-w-0">
          <legend className="text-sm font-semibold tracking-wide text-scree-700 uppercase">{group.label}</legend>
          <ul className="divide-y divide-firn-200">
            {group.items.map((item) => (
              <Stepper key={item.itemId} item={item} count={counts[item.itemId] ?? 0} onCountChange={onCountChange} />
            ))}
          </ul>
        </fieldset>
      ))}
    </div>
  );
}
