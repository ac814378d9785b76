import { availableParallelism } from 'node:os';
import { registerAs } from '@nestjs/config';
import { z } from 'zod';
import { type Env, envFlagSchema, parseEnv } from '../config/env';

/**
 * Default solver threads: every core but one, at least one, so the event loop (health, reads, other members'
 * requests) always keeps a core while plans are solved. Common practice for CPU-bound worker pools.
 */
export const defaultPlanWorkerThreads = Math.max(1, availableParallelism() - 1);
/** Default number of solves that may wait for a thread before the server answers 503 (common practice: a few per thread). */
export const defaultPlanQueueMax = 8;
/** Default time for one whole plan (optimum, swaps, gram prices), ms, counted from the request's arrival in the queue. */
export const defaultPlanTimeLimitMs = 20_000;
/**
 * Default time a hand check looks for changes that shave grams, ms, from its arrival (at most the plan limit): the
 * Try a kit tab checks on each pause of its steppers, so a large kit answers with the biggest savings in a few seconds
 * rather than hold a thread for the whole plan limit (a kit of 200 items has 200 removals at about 0.4 s each).
 */
export const defaultPlanCheckTimeLimitMs = 5_000;
/**
 * Default extra time past the limit before a solve is stopped outright, ms: the optimiser stops itself at the
 * limit, but judging the whole locker and shaving it to a kit happen before the first time check.
 */
export const defaultPlanStopGraceMs = 10_000;
/**
 * Default time a solver thread idles before it is ended, ms. A new thread compiles the engine again: on the demo trip a
 * plan over HTTP took 1.4–1.8 s on a fresh thread against 0.3–0.6 s on a warm one (measured 2026-12-04), so a thread
 * ended after a minute idle, as first built, made every plan after a pause of thought a cold one (after 75 s idle:
 * 1.4 s then, 0.6–0.85 s now). A planning session (plan, try a kit, plan again) stays on warm threads; a server that
 * stops planning frees them.
 */
export const defaultPlanThreadIdleMs = 15 * 60_000;
/**
 * Whether a solver thread is started and warmed (an invented trip planned once) when the server starts and when a
 * trip's plans are listed with no warm thread: a plan on a fresh thread loads and compiles the planner first. The demo
 * trip's first plan after start took 1.55 s without it and 0.79–0.86 s with it (measured 2026-12-04). Default on; the
 * tests turn it off but where they test it.
 */
export const defaultPlanWarmUp = true;
/** Default `Retry-After` of a 503 when every thread and queue place is taken, seconds (about one typical solve). */
export const defaultPlanRetryAfterS = 5;

const count = (name: string, min: number) =>
  z.coerce
    .number({ error: `${name} must be a number` })
    .int({ error: `${name} must be a whole number` })
    .min(min, { error: `${name} must be at least ${min}` });

const plansEnvSchema = z.object({
  PLAN_WORKER_THREADS: count('PLAN_WORKER_THREADS', 1)
    .max(64, { error: 'PLAN_WORKER_THREADS may be at most 64' })
    .default(defaultPlanWorkerThreads),
  PLAN_QUEUE_MAX: count('PLAN_QUEUE_MAX', 0)
    .max(1000, { error: 'PLAN_QUEUE_MAX may be at most 1000' })
    .default(defaultPlanQueueMax),
  PLAN_TIME_LIMIT_MS: count('PLAN_TIME_LIMIT_MS', 1)
    .max(600_000, { error: 'PLAN_TIME_LIMIT_MS may be at most 600000' })
    .default(defaultPlanTimeLimitMs),
  PLAN_CHECK_TIME_LIMIT_MS: count('PLAN_CHECK_TIME_LIMIT_MS', 1)
    .max(600_000, { error: 'PLAN_CHECK_TIME_LIMIT_MS may be at most 600000' })
    .default(defaultPlanCheckTimeLimitMs),
  PLAN_STOP_GRACE_MS: count('PLAN_STOP_GRACE_MS', 0)
    .max(600_000, { error: 'PLAN_STOP_GRACE_MS may be at most 600000' })
    .default(defaultPlanStopGraceMs),
  PLAN_THREAD_IDLE_MS: count('PLAN_THREAD_IDLE_MS', 1_000)
    .max(86_400_000, { error: 'PLAN_THREAD_IDLE_MS may be at most 86400000' })
    .default(defaultPlanThreadIdleMs),
  PLAN_WARM_UP: envFlagSchema.default(defaultPlanWarmUp),
  PLAN_RETRY_AFTER_S: count('PLAN_RETRY_AFTER_S', 1)
    .max(3600, { error: 'PLAN_RETRY_AFTER_S may be at most 3600' })
    .default(defaultPlanRetryAfterS),
});

/** The `plans` configuration namespace: the solver's threads, queue and time limits. */
export interface PlansConfig {
  /** Worker threads that solve plans (PLAN_WORKER_THREADS, default: cores − 1, at least 1). */
  workerThreads: number;
  /** Solves that may wait for a thread; one more answers 503 (PLAN_QUEUE_MAX, default 8). */
  queueMax: number;
  /** Time for one plan, from queueing to answer, ms (PLAN_TIME_LIMIT_MS, default 20000). */
  timeLimitMs: number;
  /** Time a hand check looks for shaves, from queueing, ms; at most `timeLimitMs` (PLAN_CHECK_TIME_LIMIT_MS, default 5000). */
  checkTimeLimitMs: number;
  /** Extra time before a solve past its limit is stopped and answered 422, ms (PLAN_STOP_GRACE_MS, default 10000). */
  stopGraceMs: number;
  /** Idle time after which a solver thread is ended, ms (PLAN_THREAD_IDLE_MS, default 900000: 15 minutes). */
  threadIdleMs: number;
  /** Whether a thread is warmed before the first plan (PLAN_WARM_UP, default true). */
  warmUp: boolean;
  /** `Retry-After` of the 503 when the solver is full, s (PLAN_RETRY_AFTER_S, default 5). */
  retryAfterS: number;
}

export const plansConfigKey = 'plans';

/** Reads and validates the `plans` namespace from `env`; throws on a bad value. */
export function readPlansConfig(env: Env): PlansConfig {
  const parsed = parseEnv(plansEnvSchema, env, 'plans');
  return {
    workerThreads: parsed.PLAN_WORKER_THREADS,
    queueMax: parsed.PLAN_QUEUE_MAX,
    timeLimitMs: parsed.PLAN_TIME_LIMIT_MS,
    checkTimeLimitMs: Math.min(parsed.PLAN_CHECK_TIME_LIMIT_MS, parsed.PLAN_TIME_LIMIT_MS),
    stopGraceMs: parsed.PLAN_STOP_GRACE_MS,
    threadIdleMs: parsed.PLAN_THREAD_IDLE_MS,
    warmUp: parsed.PLAN_WARM_UP,
    retryAfterS: parsed.PLAN_RETRY_AFTER_S,
  };
}

/** `registerAs` factory for the `plans` namespace over a given environment. */
export const plansConfig = (env: Env) => registerAs(plansConfigKey, () => readPlansConfig(env));
