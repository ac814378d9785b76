import { planModelVersion } from '@gramwatt/shared';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { usePlan } from '../api/get-plan';
import { usePlans } from '../api/get-plans';
import { changedAfter, useTripChangedAt } from '../api/get-trip-party';
import type { PlanTabProps } from '../types';
import { PlanView } from './plan-view';
import { SolveAction } from './solve-action';
import { TabError, TabLoading } from './tab-states';

/** The Plan tab: the newest stored plan of the trip, and the action that finds the lightest kit again. */
export function PlanTab({ tripId, canSolve, canChooseKit }: PlanTabProps) {
  const plans = usePlans(tripId);
  const [solvedId, setSolvedId] = useState<string | null>(null);
  const latestId = plans.data?.[0]?.id;
  const plan = usePlan(tripId, latestId);
  const changedAt = useTripChangedAt(tripId).data;
  const isOutdated = plan.data !== undefined && changedAfter(plan.data.createdAt, changedAt, plan.data.gearChangedAt);
  const gearAddedCount = plan.data?.gearAddedCount ?? 0;
  const isEarlierPlanner = plan.data !== undefined && plan.data.modelVersion !== planModelVersion;

  const solve = canSolve && (
    <SolveAction tripId={tripId} hasPlan={latestId !== undefined} onSolved={(p) => setSolvedId(p.id)} />
  );

  if (plans.isPending) return <TabLoading label="Loading the plans" />;
  if (plans.isError)
    return (
      <TabError
        title="The plans could not be loaded"
        error={plans.error}
        retry={
          <Button variant="secondary" size="sm" onClick={() => void plans.refetch()}>
            Try again
          </Button>
        }
      />
    );
  if (latestId === undefined)
    return (
      <div className="flex flex-col gap-4">
        <EmptyState title="No plan yet — find the lightest kit">
          {canSolve
            ? 'Gramwatt weighs the trip’s gear (the leader’s locker and anything shared on the Party tab) against its sun, sky and devices, and stores the lightest kit that keeps every device charged.'
            : 'The trip’s leader or a partner finds the lightest kit; it will show here.'}
        </EmptyState>
        {solve}
      </div>
    );

  return (
    <div className="flex flex-col gap-6">
      {isOutdated && (
        <Alert tone="caution" title="The trip or its gear changed after this plan was made">
          Its devices, their use or the gear are not what the planner weighed.{' '}
          {canSolve
            ? 'Find the lightest kit again for the trip as it is now.'
            : 'The leader or a partner can solve it again.'}
        </Alert>
      )}
      {!isOutdated && gearAddedCount > 0 && (
        <Alert tone="info" title="Gear joined the trip after this plan was made">
          {gearAddedCount === 1
            ? 'Since then, one item of power gear was added to the locker or the pool, or more of it is now owned. This plan did not weigh it; it may make a lighter kit.'
            : `Since then, ${gearAddedCount} items of power gear were added to the locker or the pool, or more of them are now owned. This plan did not weigh them; they may make a lighter kit.`}{' '}
          {canSolve
            ? `Find the lightest kit again to weigh ${gearAddedCount === 1 ? 'it' : 'them'}.`
            : 'The leader or a partner can solve it again.'}
        </Alert>
      )}
      {isEarlierPlanner && (
        <Alert tone="caution" title="An earlier version of the planner made this plan">
          Gramwatt now weighs the same trip and gear a little differently, so this kit and its figures may no longer be
          its answer.{' '}
          {canSolve
            ? 'Find the lightest kit again to see the current answer.'
            : 'The leader or a partner can solve it again.'}
        </Alert>
      )}
      {solve}
      {plan.isPending ? (
        <TabLoading label="Loading the plan" />
      ) : plan.isError ? (
        <TabError title="The plan could not be loaded" error={plan.error} />
      ) : (
        <PlanView
          tripId={tripId}
          plan={plan.data}
          canChooseKit={canChooseKit}
          focusAnswer={plan.data.id === solvedId}
        />
      )}
    </div>
  );
}
