import { planModelVersion } from '@gramwatt/shared';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { formatDate } from '@/lib/format';
import { useChosenKit } from '../api/get-chosen-kit';
import { changedAfter, useTripChangedAt, useTripParty } from '../api/get-trip-party';
import type { PlanTabProps } from '../types';
import { PackingList } from './packing-list';
import './packing-list-print.css';
import { TabError, TabLoading } from './tab-states';

/** The Packing list tab: the chosen kit as a list to pack and print. */
export function PackingListTab({ tripId, canChooseKit }: PlanTabProps) {
  const chosen = useChosenKit(tripId);
  const party = useTripParty(tripId);
  const changedAt = useTripChangedAt(tripId).data;

  if (chosen.isPending || party.isPending) return <TabLoading label="Loading the packing list" />;
  if (chosen.isError) return <TabError title="The chosen kit could not be loaded" error={chosen.error} />;
  if (party.isError) return <TabError title="The trip could not be loaded" error={party.error} />;
  if (!chosen.data)
    return (
      <EmptyState title="No kit chosen yet">
        Find the lightest kit on the Plan tab, or pick one on Try a kit, and the packing list follows from it.
      </EmptyState>
    );

  const isOutdated = changedAfter(chosen.data.updatedAt, changedAt, chosen.data.gearChangedAt);
  const again = canChooseKit
    ? 'Choose the kit again (on the Plan or the Try a kit tab) to have it judged afresh.'
    : 'The leader or a partner can choose it again to have it judged afresh.';

  return (
    <article data-print-root aria-labelledby="packing-list-heading" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id="packing-list-heading" className="text-lg font-semibold text-scree-950">
            Packing list: {party.data.name}
          </h2>
          <p className="text-sm text-scree-700">
            {formatDate(party.data.startDate)} to {formatDate(party.data.endDate)} · {party.data.days} days · times in{' '}
            {party.data.timeZone}
          </p>
        </div>
        <Button variant="secondary" onClick={() => window.print()}>
          Print
        </Button>
      </div>
      {isOutdated && (
        <Alert tone="caution" title="The trip or its gear changed after this kit was chosen">
          Its verdict and schedule are for the devices, use and gear the trip had then. {again}
        </Alert>
      )}
      {chosen.data.modelVersion !== planModelVersion && (
        <Alert tone="caution" title="An earlier version of the planner judged this kit">
          Gramwatt now weighs the same trip and gear a little differently, so its verdict and schedule may no longer be
          the planner&apos;s. {again}
        </Alert>
      )}
      <PackingList chosen={chosen.data} members={party.data.members} devices={party.data.devices} />
    </article>
  );
}
