import { Button } from '@/components/ui/button';
import type { LockerItem } from '../api/types';

/** The notices for deleted items, each with its Undo button, at the bottom of the screen. */
export function UndoToasts({ items, onUndo }: { items: readonly LockerItem[]; onUndo: (itemId: string) => void }) {
  return (
    <div
      role="status"
      aria-live="polite"
      className="pointer-events-none fixed inset-x-0 bottom-0 z-40 flex flex-col items-center gap-2 px-4 pb-4"
    >
      {items.map((item) => (
        <div
          key={item.id}
          className="pointer-events-auto flex w-full max-w-md items-center justify-between gap-4 rounded-xl bg-scree-900 px-4 py-3 text-firn-50 shadow-xl"
        >
          <p className="min-w-0 text-sm">
            <span className="font-semibold">{item.name}</span> deleted.
          </p>
          <Button
            variant="secondary"
            size="sm"
            onClick={() => onUndo(item.id)}
            aria-label={`Undo deleting ${item.name}`}
            className="shrink-0"
          >
            Undo
          </Button>
        </div>
      ))}
    </div>
  );
}
