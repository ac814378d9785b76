import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { isApiError } from '@/lib/api-client';
import { useCreatePlan } from '../api/create-plan';
import type { PlanRecord } from '../api/types';
import { useCountdown } from '../hooks/use-countdown';
import { useElapsed } from '../hooks/use-elapsed';
import { defaultBusyWaitS } from './busy-notice';
import { SolveProgress } from './solve-progress';

/** How long a solve may take before the progress shows: a quick answer should not flash a bar (common practice). */
const progressGraceMs = 600;

export interface SolveActionProps {
  tripId: string;
  hasPlan: boolean;
  onSolved: (plan: PlanRecord) => void;
}

/** "Find the lightest kit": the solve, its progress, and what a busy (503) or unsolvable (422) answer means. */
export function SolveAction({ tripId, hasPlan, onSolved }: SolveActionProps) {
  const solve = useCreatePlan();
  const { isSlow, seconds } = useElapsed(solve.isPending, progressGraceMs);
  const busy = useCountdown();
  const run = () =>
    solve.mutate(
      { tripId },
      {
        onSuccess: onSolved,
        onError: (error) => {
          if (isApiError(error, 503)) busy.start(error.retryAfterS ?? defaultBusyWaitS);
        },
      },
    );
  const error = solve.error;

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={run} isLoading={solve.isPending} disabled={busy.secondsLeft > 0}>
          {hasPlan ? 'Find the lightest kit again' : 'Find the lightest kit'}
        </Button>
        {solve.isPending && !isSlow && <span className="text-scree-700">Solving…</span>}
      </div>
      {solve.isPending && isSlow && <SolveProgress seconds={seconds} />}
      {error &&
        (isApiError(error, 503) ? (
          <Alert
            tone="caution"
            title={busy.secondsLeft > 0 ? 'The planner is busy' : 'The planner should have room now'}
          >
            {busy.secondsLeft > 0 ? (
              <>
                The planner is busy, try again in <span className="tabular-nums">{busy.secondsLeft}</span> s.
              </>
            ) : (
              'Try again.'
            )}
          </Alert>
        ) : isApiError(error, 422) ? (
          <Alert tone="error" title="This trip cannot be solved as asked">
            {error.message}
          </Alert>
        ) : (
          <Alert tone="error" title="The plan could not be made">
            {error.message}
          </Alert>
        ))}
    </div>
  );
}
