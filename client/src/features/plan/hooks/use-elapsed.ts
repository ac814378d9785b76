import { useEffect, useState } from 'react';

/**
 * While `running`, whether `graceMs` has passed (so a quick answer shows no progress at all) and the whole seconds
 * since it started; both reset when it stops.
 */
export function useElapsed(running: boolean, graceMs: number): { isSlow: boolean; seconds: number } {
  const [state, setState] = useState({ isSlow: false, seconds: 0 });
  useEffect(() => {
    if (!running) {
      setState({ isSlow: false, seconds: 0 });
      return;
    }
    const startMs = Date.now();
    const tick = () =>
      setState({ isSlow: Date.now() - startMs >= graceMs, seconds: Math.floor((Date.now() - startMs) / 1000) });
    const grace = setTimeout(tick, graceMs);
    const every = setInterval(tick, 1000);
    return () => {
      clearTimeout(grace);
      clearInterval(every);
    };
  }, [running, graceMs]);
  return state;
}
