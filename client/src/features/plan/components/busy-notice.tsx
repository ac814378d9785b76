import { useEffect } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { useCountdown } from '../hooks/use-countdown';

/** The wait to suggest when a busy answer names none, s (from memory: about one solve of a week-long trip). */
export const defaultBusyWaitS = 10;

/** "The planner is busy, try again in N s", counting down; the retry button wakes up when the wait is over. */
export function BusyNotice({
  retryAfterS,
  onRetry,
  retryLabel,
}: {
  retryAfterS: number | null;
  onRetry: () => void;
  retryLabel: string;
}) {
  const { secondsLeft, start } = useCountdown();
  useEffect(() => start(retryAfterS ?? defaultBusyWaitS), [retryAfterS, start]);
  return (
    <Alert tone="caution" title="The planner is busy">
      {secondsLeft > 0 ? (
        <>
          The planner is busy, try again in <span className="tabular-nums">{secondsLeft}</span> s.
        </>
      ) : (
        'The planner should have room now.'
      )}
      <div className="mt-2">
        <Button variant="secondary" size="sm" disabled={secondsLeft > 0} onClick={onRetry}>
          {retryLabel}
        </Button>
      </div>
    </Alert>
  );
}
