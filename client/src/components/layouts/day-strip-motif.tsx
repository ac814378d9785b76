import { cn } from '../ui/cn';

/** Stored energy at the start of each day, as a share of full, for the decorative strip on the sign-in page (invented). */
const motifSharePerDay = [1, 0.86, 0.74, 0.81, 0.63, 0.44, 0, 0.38, 0.57, 0.7];

/**
 * A small picture of the day strip: one cell per trip day, filled to the energy still stored, the dry day hatched.
 * Purely decorative here (hidden from screen readers); the real strip belongs to the plan screen.
 */
export function DayStripMotif({ className }: { className?: string }) {
  return (
    <div aria-hidden="true" className={cn('flex items-end gap-1.5', className)}>
      {motifSharePerDay.map((share, day) => (
        <div
          key={day}
          className={cn(
            'relative h-14 flex-1 overflow-hidden rounded-md border-2',
            share === 0 ? 'border-larch-300 bg-dry-hatch text-larch-300/70' : 'border-moss-300/60 bg-scree-800',
          )}
        >
          {share > 0 && (
            <div className="absolute inset-x-0 bottom-0 bg-moss-400" style={{ height: `${share * 100}%` }} />
          )}
        </div>
      ))}
    </div>
  );
}
