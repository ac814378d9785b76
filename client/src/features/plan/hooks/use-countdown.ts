import { useCallback, useEffect, useState } from 'react';

/** Seconds left of a wait the server asked for (Retry-After), counting down to 0; `start(n)` begins a new wait. */
export function useCountdown(): { secondsLeft: number; start: (seconds: number) => void } {
  const [untilMs, setUntilMs] = useState<number | null>(null);
  const [secondsLeft, setSecondsLeft] = useState(0);
  const start = useCallback((seconds: number) => {
    setUntilMs(Date.now() + seconds * 1000);
    setSecondsLeft(seconds);
  }, []);
  useEffect(() => {
    if (untilMs === null) return;
    const timer = setInterval(() => {
      const left = Math.max(0, Math.ceil((untilMs - Date.now()) / 1000));
      setSecondsLeft(left);
      if (left === 0) setUntilMs(null);
    }, 250);
    return () => clearInterval(timer);
  }, [untilMs]);
  return { secondsLeft, start };
}
