import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlanRecord, PlanRequest, PlanSummary } from '@gramwatt/shared';
import { api } from '@/lib/api-client';
import { getChosenKitQueryOptions } from './get-chosen-kit';
import { getPlanQueryOptions } from './get-plan';
import { getPlansQueryOptions } from './get-plans';
import { tripPath } from './trip-path';

export interface CreatePlanInput {
  tripId: string;
  body?: PlanRequest;
}

/**
 * `POST /api/trips/:id/plans`: solves the trip and stores the plan. May answer 503 with `Retry-After` while the
 * planner is busy, or 422 when the trip cannot be solved as asked.
 */
export const createPlan = async ({ tripId, body = {} }: CreatePlanInput): Promise<PlanRecord> =>
  (await api.post<{ plan: PlanRecord }>(tripPath(tripId, 'plans'), body)).plan;

/** The list line of a fresh plan, so the newest plan shows at once without waiting for the list. */
const summaryOf = ({ result, ...plan }: PlanRecord): PlanSummary => ({
  ...plan,
  status: result.status,
  headline: result.headline,
  massG: result.kit?.massG ?? null,
});

export const useCreatePlan = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPlan,
    onSuccess: async (plan, { tripId }) => {
      queryClient.setQueryData(getPlanQueryOptions(tripId, plan.id).queryKey, plan);
      queryClient.setQueryData(getPlansQueryOptions(tripId).queryKey, (plans = []) => [
        summaryOf(plan),
        ...plans.filter((p) => p.id !== plan.id),
      ]);
      // A solve may set the trip's chosen kit to the new optimum.
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: getPlansQueryOptions(tripId).queryKey, exact: true }),
        queryClient.invalidateQueries({ queryKey: getChosenKitQueryOptions(tripId).queryKey }),
      ]);
    },
  });
};
