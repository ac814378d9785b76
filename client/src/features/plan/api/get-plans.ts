import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PlanSummary } from '@gramwatt/shared';
import { api } from '@/lib/api-client';
import { tripPath } from './trip-path';

/** `GET /api/trips/:id/plans`: the trip's stored plans, newest first, without their heavy results. */
export const getPlans = async (tripId: string, signal?: AbortSignal): Promise<PlanSummary[]> =>
  (await api.get<{ plans: PlanSummary[] }>(tripPath(tripId, 'plans'), signal)).plans;

export const getPlansQueryOptions = (tripId: string) =>
  queryOptions({ queryKey: ['trips', tripId, 'plans'], queryFn: ({ signal }) => getPlans(tripId, signal) });

export const usePlans = (tripId: string) => useQuery(getPlansQueryOptions(tripId));
