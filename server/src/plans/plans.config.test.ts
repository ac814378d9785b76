import { existsSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { defaultPlanWorkerFile } from './plan-solver';
import { defaultPlanWorkerThreads, readPlansConfig } from './plans.config';

describe('plans config', () => {
  it('defaults: cores − 1 threads (at least 1), 8 waiting, 20 s per plan, 5 s of shaves per check, 10 s grace, threads kept 15 min idle, a thread warmed up, retry after 5 s', () => {
    expect(readPlansConfig({})).toEqual({
      workerThreads: defaultPlanWorkerThreads,
      queueMax: 8,
      timeLimitMs: 20_000,
      checkTimeLimitMs: 5_000,
      stopGraceMs: 10_000,
      threadIdleMs: 900_000,
      warmUp: true,
      retryAfterS: 5,
    });
    expect(defaultPlanWorkerThreads).toBeGreaterThanOrEqual(1);
  });

  it('reads every variable; an empty one means the default', () => {
    expect(
      readPlansConfig({
        PLAN_WORKER_THREADS: '3',
        PLAN_QUEUE_MAX: '0',
        PLAN_TIME_LIMIT_MS: '500',
        PLAN_CHECK_TIME_LIMIT_MS: '300',
        PLAN_STOP_GRACE_MS: '0',
        PLAN_THREAD_IDLE_MS: '60000',
        PLAN_WARM_UP: 'false',
        PLAN_RETRY_AFTER_S: '30',
      }),
    ).toEqual({
      workerThreads: 3,
      queueMax: 0,
      timeLimitMs: 500,
      checkTimeLimitMs: 300,
      stopGraceMs: 0,
      threadIdleMs: 60_000,
      warmUp: false,
      retryAfterS: 30,
    });
    expect(readPlansConfig({ PLAN_QUEUE_MAX: ' ' }).queueMax).toBe(8);
    // A check never looks for shaves longer than a plan may take.
    expect(readPlansConfig({ PLAN_TIME_LIMIT_MS: '2000' }).checkTimeLimitMs).toBe(2_000);
  });

  it.each([
    ['PLAN_WORKER_THREADS', '0'],
    ['PLAN_WORKER_THREADS', 'two'],
    ['PLAN_QUEUE_MAX', '-1'],
    ['PLAN_TIME_LIMIT_MS', '0'],
    ['PLAN_TIME_LIMIT_MS', '1.5'],
    ['PLAN_CHECK_TIME_LIMIT_MS', '0'],
    ['PLAN_THREAD_IDLE_MS', '999'],
    ['PLAN_WARM_UP', 'sometimes'],
    ['PLAN_RETRY_AFTER_S', '0'],
  ])('refuses %s=%s at boot, naming the variable', (name, value) => {
    expect(() => readPlansConfig({ [name]: value })).toThrow(
      new RegExp(`Invalid plans configuration:[\\s\\S]*${name}`),
    );
  });

  it('finds the worker file beside the package, from the sources as from the build', () => {
    expect(defaultPlanWorkerFile).toMatch(/server[\\/]workers[\\/]plan-solver\.worker\.mjs$/);
    expect(existsSync(defaultPlanWorkerFile)).toBe(true);
  });
});
