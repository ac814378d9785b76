import type { ChooseKitRequest } from '@gramwatt/shared';
import { Button } from '@/components/ui/button';
import { useChooseKit } from '../api/choose-kit';
import { useChosenKit } from '../api/get-chosen-kit';
import type { KitSelection } from '../api/types';
import { sameSelection } from '../utils/kit-selection';

export interface ChooseKitButtonProps {
  tripId: string;
  selection: KitSelection;
  source: ChooseKitRequest['source'];
  planId?: string;
  /** What the kit is, for the button's accessible name ("Use this kit: the swap adding …"). */
  description?: string;
}

/**
 * "Use this kit": stores a kit as the trip's chosen kit (leader only), which the packing list uses. Once the kit is
 * the chosen one the button gives way to a line saying so.
 */
export function ChooseKitButton({ tripId, selection, source, planId, description }: ChooseKitButtonProps) {
  const chosen = useChosenKit(tripId);
  const choose = useChooseKit();
  const isChosen = chosen.data ? sameSelection(chosen.data.kit.lines, selection) : false;
  if (isChosen)
    return (
      <p role="status" className="flex items-center gap-2 font-medium text-moss-800">
        <svg viewBox="0 0 16 16" className="size-4" aria-hidden="true">
          <path d="m3 8.5 3 3 7-7" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
        </svg>
        The trip&rsquo;s chosen kit: the packing list uses it.
      </p>
    );
  return (
    <div className="flex flex-col items-start gap-1.5">
      <Button
        variant="secondary"
        isLoading={choose.isPending}
        aria-label={description ? `Use this kit: ${description}` : undefined}
        onClick={() => choose.mutate({ tripId, body: { kit: selection, source, ...(planId ? { planId } : {}) } })}
      >
        Use this kit
      </Button>
      {choose.isError && (
        <p role="alert" className="text-sm font-medium text-rosehip-700">
          This kit could not be chosen: {choose.error.message}
        </p>
      )}
    </div>
  );
}
