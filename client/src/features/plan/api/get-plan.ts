import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PlanRecord } from '@gramwatt/shared';
import { api } from '@/lib/api-client';
import { tripPath } from './trip-path';

/** `GET /api/trips/:id/plans/:planId`: one stored plan with its whole result. */
export const getPlan = async (tripId: string, planId: string, signal?: AbortSignal): Promise<PlanRecord> =>
  (await api.get<{ plan: PlanRecord }>(tripPath(tripId, 'plans', planId), signal)).plan;

export const getPlanQueryOptions = (tripId: string, planId: string) =>
  queryOptions({
    queryKey: ['trips', tripId, 'plans', planId],
    queryFn: ({ signal }) => getPlan(tripId, planId, signal),
    // A stored plan never changes: a new solve makes a new plan.
    staleTime: Infinity,
  });

/** The plan with this id, or nothing while there is no id (a trip not solved yet). */
export const usePlan = (tripId: string, planId: string | undefined) =>
  useQuery({ ...getPlanQueryOptions(tripId, planId ?? ''), enabled: planId !== undefined });
