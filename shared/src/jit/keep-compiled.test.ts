import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { describe, expect, it } from 'vitest';
import { keepCompiled, releaseCompiled } from './keep-compiled.js';

// A full collection on demand: the flag exposes `gc` to contexts made after it is set.
setFlagsFromString('--expose-gc');
const fullGc = runInNewContext('gc') as () => void;

/**
 * A weak reference to a closure made per call, as the hot sites make them; with `site`, kept there. Only the reference
 * leaves the call, so the test's own frame never holds the closure.
 */
function closureOfCall(site?: string): WeakRef<() => number> {
  const data = [1, 2, 3];
  const closure = (): number => data.length;
  if (site) keepCompiled(site, closure);
  return new WeakRef(closure);
}

/** Lets the current job end (a WeakRef's target is held until then), then collects everything it can. */
async function collect(): Promise<void> {
  await new Promise((resolve) => setTimeout(resolve, 0));
  fullGc();
  await new Promise((resolve) => setTimeout(resolve, 0));
  fullGc();
}

describe('keepCompiled', () => {
  it('keeps the latest closures of a site through a full collection', async () => {
    const keptRef = closureOfCall('test site');
    const dropped = closureOfCall();
    await collect();
    expect(keptRef.deref()).toBeDefined();
    // The same collection takes a closure nothing holds: the check above is not vacuous.
    expect(dropped.deref()).toBeUndefined();
    releaseCompiled('test site');
  });

  it('lets the earlier closures go when a site keeps newer ones, and all of them on release', async () => {
    const firstRef = closureOfCall('test site');
    const secondRef = closureOfCall('test site');
    await collect();
    expect(firstRef.deref()).toBeUndefined();
    expect(secondRef.deref()).toBeDefined();
    releaseCompiled('test site');
    await collect();
    expect(secondRef.deref()).toBeUndefined();
  });
});
