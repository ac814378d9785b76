import { cn } from '@/components/ui/cn';
import type { DayStripCell, DesignSkyId } from '../api/types';
import { dayLabel, formatPercent, formatShortDate, formatWh, skyLabels } from '../utils/format';

export interface DayStripProps {
  cells: readonly DayStripCell[];
  /** The design sky the strip shows (the plan's binding sky). */
  skyId: DesignSkyId;
  /** Labels the strip, e.g. the id of the heading above it. */
  'aria-labelledby'?: string;
}

/** Phones show a week per row; wider screens up to a fortnight, so a cell stays wide enough to read. */
const columnsOn = (cellCount: number) => ({
  '--strip-cols-narrow': `repeat(${Math.min(cellCount, 7)}, minmax(0, 1fr))`,
  '--strip-cols-wide': `repeat(${Math.min(cellCount, 14)}, minmax(0, 1fr))`,
});

function cellText(cell: DayStripCell): string {
  const when = `${dayLabel(cell.dayIndex)}, ${formatShortDate(cell.date)}`;
  return cell.dry
    ? `${when}: dry — a device goes without, ${formatWh(cell.storedEndWh)} left at the day's end`
    : `${when}: ${formatPercent(cell.storedEndShare)} stored at the day's end (${formatWh(cell.storedEndWh)})`;
}

/**
 * Gramwatt's day strip: one cell per trip day, filled from the bottom by the energy still stored at the day's end.
 * A dry day is hatched and says "dry", so it reads without colour; each cell is a list item with its own sentence.
 */
export function DayStrip({ cells, skyId, ...props }: DayStripProps) {
  return (
    <div className="flex flex-col gap-2">
      <ol
        {...props}
        style={columnsOn(cells.length) as React.CSSProperties}
        className="grid grid-cols-(--strip-cols-narrow) gap-1.5 sm:grid-cols-(--strip-cols-wide)"
      >
        {cells.map((cell) => (
          <li key={cell.dayIndex} className="flex min-w-0 flex-col items-center gap-1">
            <span className="sr-only">{cellText(cell)}</span>
            <div
              aria-hidden="true"
              className={cn(
                'relative h-20 w-full overflow-hidden rounded-md border-2',
                cell.dry ? 'border-larch-600 bg-larch-50 bg-dry-hatch text-larch-500' : 'border-scree-300 bg-firn-100',
              )}
            >
              {!cell.dry && (
                <div
                  className="absolute inset-x-0 bottom-0 bg-moss-600"
                  style={{ height: `${Math.round(cell.storedEndShare * 100)}%` }}
                />
              )}
            </div>
            <span aria-hidden="true" className="text-xs font-medium text-scree-800 tabular-nums">
              {cell.dry ? 'dry' : formatPercent(cell.storedEndShare)}
            </span>
            <span aria-hidden="true" className="text-xs text-scree-600">
              {cell.dayIndex + 1}
            </span>
          </li>
        ))}
      </ol>
      <p className="text-sm text-scree-700">
        Stored energy at each day&rsquo;s end, as a share of all the kit and devices can hold, in the{' '}
        {skyLabels[skyId].toLowerCase()}. Numbers under the cells are trip days; hatched cells are dry days.
      </p>
    </div>
  );
}
