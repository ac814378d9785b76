import { useEffect, useMemo, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Spinner } from '@/components/ui/spinner';
import { isApiError } from '@/lib/api-client';
import { useCheckKit } from '../api/check-kit';
import { useChosenKit } from '../api/get-chosen-kit';
import { usePlan } from '../api/get-plan';
import { usePlans } from '../api/get-plans';
import { useTripGear } from '../api/get-trip-gear';
import type { CheckResult, KitSelection } from '../api/types';
import { useDebouncedValue } from '../hooks/use-debounced-value';
import type { PlanTabProps } from '../types';
import { selectionOf } from '../utils/kit-selection';
import { BusyNotice } from './busy-notice';
import { CautionsList } from './cautions-list';
import { ChooseKitButton } from './choose-kit-button';
import { DayStripSection } from './evaluation-parts';
import { GramMeter } from './gram-meter';
import { KitPicker } from './kit-picker';
import { LedgerTable } from './ledger-table';
import { PlanSection } from './plan-section';
import { ShavesList } from './shaves-list';
import { TabError, TabLoading } from './tab-states';
import { VerdictSentence } from './verdict-sentence';

/** How long the steppers must rest before the kit is checked, ms (common practice for typing-driven requests). */
export const checkDebounceMs = 400;

type Counts = Record<string, number>;

const countsOf = (selection: KitSelection): Counts => Object.fromEntries(selection.map((l) => [l.itemId, l.count]));
const selectionFrom = (counts: Counts): KitSelection =>
  Object.entries(counts)
    .filter(([, count]) => count > 0)
    .map(([itemId, count]) => ({ itemId, count }));

/** The kit to start from: the trip's chosen kit, else the newest plan's kit, else nothing. */
function useStartingKit(tripId: string): { ready: boolean; selection: KitSelection } {
  const chosen = useChosenKit(tripId);
  const plans = usePlans(tripId);
  const latest = usePlan(tripId, plans.data?.[0]?.id);
  const planSettled = !plans.isPending && (plans.data?.length === 0 || plans.isError || !latest.isPending);
  const ready = !chosen.isPending && planSettled;
  const selection = chosen.data
    ? selectionOf(chosen.data.kit)
    : latest.data?.result.kit
      ? selectionOf(latest.data.result.kit)
      : [];
  return { ready, selection };
}

function CheckAnswer({
  tripId,
  result,
  canChooseKit,
  selection,
  onShave,
}: {
  tripId: string;
  result: CheckResult;
  canChooseKit: boolean;
  selection: KitSelection;
  onShave: (change: CheckResult['shaves'][number]['change']) => void;
}) {
  return (
    <div className="flex flex-col gap-6">
      <section aria-label="How this kit does" className="flex flex-col gap-3">
        <VerdictSentence verdict={result.evaluation.verdict} />
        <GramMeter kit={result.kit} />
        {canChooseKit && <ChooseKitButton tripId={tripId} source="hand" selection={selection} />}
      </section>
      <DayStripSection evaluation={result.evaluation} />
      <PlanSection title="Shave grams" intro="Changes that make this kit lighter and still keep every device charged.">
        <ShavesList shaves={result.shaves} untriedChanges={result.untriedChanges} onApply={onShave} />
      </PlanSection>
      <PlanSection title="Ledger" intro="Each day's energy, in Wh.">
        <LedgerTable ledgers={result.evaluation.ledgers} bindingSkyId={result.evaluation.bindingSkyId} />
      </PlanSection>
      <PlanSection title="Cautions">
        <CautionsList cautions={result.evaluation.cautions} />
      </PlanSection>
    </div>
  );
}

/**
 * Try a kit: pick the locker's power gear by hand and see, a moment after each change, the verdict, the day strip,
 * the ledger and the changes that shave grams. "Use this kit" makes it the trip's chosen kit.
 */
export function TryKitTab({ tripId, canSolve, canChooseKit }: PlanTabProps) {
  const gear = useTripGear(tripId, canChooseKit);
  const start = useStartingKit(tripId);
  const [counts, setCounts] = useState<Counts | null>(null);
  useEffect(() => {
    if (counts === null && start.ready) setCounts(countsOf(start.selection));
  }, [counts, start.ready, start.selection]);

  const selection = useMemo(() => selectionFrom(counts ?? {}), [counts]);
  const settled = useDebouncedValue(selection, checkDebounceMs);
  const check = useCheckKit(tripId, settled);
  const gearById = useMemo(() => new Map((gear.data?.gear ?? []).map((item) => [item.itemId, item])), [gear.data]);

  if (!canSolve)
    return (
      <EmptyState title="Trying kits is for the leader and partners">
        As a viewer you see the plan and the packing list; the leader and partners try kits from their lockers.
      </EmptyState>
    );
  if (gear.error) return <TabError title="The trip's gear could not be loaded" error={gear.error} />;
  if (!gear.data || counts === null) return <TabLoading label="Loading the trip's gear" />;
  if (gear.data.gear.length === 0)
    return (
      <EmptyState title="No power gear for this trip yet">
        {gear.data.leaderLockerHidden
          ? 'The plan draws on the leader’s locker, which only the leader can pick from. Share gear on the Party tab to try kits here.'
          : 'Add panels, banks, 12 V packs, converters, controllers and leads to the locker or share them on the Party tab, then pick a kit from them here.'}
      </EmptyState>
    );

  const setCount = (itemId: string, count: number) => setCounts((c) => ({ ...c, [itemId]: count }));
  const applyShave = (change: CheckResult['shaves'][number]['change']) =>
    setCounts((c) => {
      const next = { ...c, [change.itemId]: Math.max(0, (c?.[change.itemId] ?? 0) - 1) };
      if (change.kind === 'replace') {
        const owned = gearById.get(change.withItemId)?.maxCount ?? 1;
        next[change.withItemId] = Math.min(owned, (c?.[change.withItemId] ?? 0) + 1);
      }
      return next;
    });
  const isChecking = check.isFetching || settled !== selection;
  const error = check.error;

  return (
    <div className="grid gap-8 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
      <PlanSection
        title="Pick the kit"
        intro={
          gear.data.leaderLockerHidden
            ? 'From the gear shared for this trip. The plan also weighs the leader’s locker, which only the leader can pick from.'
            : 'From the gear this trip’s plan weighs, up to the units that may go.'
        }
      >
        <KitPicker gear={gear.data.gear} counts={counts} onCountChange={setCount} />
        <div className="flex flex-wrap gap-2">
          <Button variant="quiet" size="sm" onClick={() => setCounts(countsOf(start.selection))}>
            Start again from the {start.selection.length ? 'plan’s kit' : 'empty kit'}
          </Button>
          <Button variant="quiet" size="sm" onClick={() => setCounts({})}>
            Empty the kit
          </Button>
        </div>
      </PlanSection>

      <div className="flex min-w-0 flex-col gap-4" aria-busy={isChecking || undefined}>
        <p role="status" className="flex min-h-6 items-center gap-2 text-sm text-scree-700">
          {selection.length > 0 && isChecking && (
            <>
              <span aria-hidden="true">
                <Spinner size="sm" />
              </span>
              Checking this kit on the trip…
            </>
          )}
        </p>
        {selection.length === 0 ? (
          <EmptyState title="Pick some gear">
            Add a panel, a bank and the leads to see whether they keep every device charged on this trip.
          </EmptyState>
        ) : error && !check.data ? (
          isApiError(error, 503) ? (
            <BusyNotice retryAfterS={error.retryAfterS} retryLabel="Check again" onRetry={() => void check.refetch()} />
          ) : (
            <TabError title="This kit could not be checked" error={error} />
          )
        ) : check.data ? (
          <div className={check.isPlaceholderData ? 'opacity-60 transition-opacity' : 'transition-opacity'}>
            {error && (
              <Alert tone="error" title="The last change could not be checked" className="mb-4">
                {error.message}
              </Alert>
            )}
            <CheckAnswer
              tripId={tripId}
              result={check.data}
              canChooseKit={canChooseKit}
              selection={settled}
              onShave={applyShave}
            />
          </div>
        ) : (
          <TabLoading label="Checking this kit" />
        )}
      </div>
    </div>
  );
}
