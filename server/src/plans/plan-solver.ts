import { resolve } from 'node:path';
import {
  Inject,
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnModuleDestroy,
  ServiceUnavailableException,
  UnprocessableEntityException,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { type KitSelection, type PlanningInput, PlanningInputError } from '@gramwatt/shared';
import Piscina from 'piscina';
import { type PlansConfig, plansConfigKey } from './plans.config';
import type { PlanSolverAnswer, PlanSolverTask, PlanSolverValues } from './plan-solver-task';
import { errorMessage } from '../common/error-message';

/**
 * The worker file: a plain ES module beside the package (`server/workers/`), found from this file — `src/plans`
 * and `dist/plans` are both two levels below the package root — so tests (from src) and the build run the same one.
 */
export const defaultPlanWorkerFile = resolve(__dirname, '../../workers/plan-solver.worker.mjs');

/** Injection token of the worker file's path (a test may hand in a slower stand-in). */
export const PLAN_WORKER_FILE = Symbol.for('gramwatt:PLAN_WORKER_FILE');

/** Every thread and queue place is taken: 503 with `Retry-After`. */
export class PlanSolverBusyException extends ServiceUnavailableException {
  constructor(readonly retryAfterS: number) {
    super(`The planner is busy with other plans: try again in ${retryAfterS} s`);
  }
}

/** A timed run: the value, the thread it ran on, and the time from queueing to answer. */
export interface SolverRun<V> {
  value: V;
  threadId: number;
  durationMs: number;
}

/**
 * Runs plans, hand checks and kit evaluations in a pool of worker threads, so a solve never blocks the event
 * loop. At most `workerThreads` run at once and `queueMax` wait; one more is refused at once (503). A plan gets
 * `timeLimitMs` from its arrival (queue wait included) and stops itself with the best kit it has verified; a task
 * still running `stopGraceMs` later is stopped (its thread is ended and replaced) and answered 422, since no kit
 * was verified in time.
 */
@Injectable()
export class PlanSolver implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(PlanSolver.name);
  private readonly config: PlansConfig;
  private readonly pool: Piscina<PlanSolverTask, PlanSolverAnswer>;
  private inFlight = 0;
  /** When the last task ended (performance.now()): a thread used since less than its idle time ago is still warm. */
  private lastUsedMs = -Infinity;
  /** The warm-up running now, if any (a second call waits for it rather than start another). */
  private warming: Promise<number | undefined> | undefined;
  /** Set when the module is destroyed: a warm-up stopped by the pool's end is not a failure to log. */
  private closing = false;

  constructor(config: ConfigService, @Inject(PLAN_WORKER_FILE) workerFile: string) {
    this.config = config.getOrThrow<PlansConfig>(plansConfigKey);
    this.pool = new Piscina({
      filename: workerFile,
      // None of the parent's Node flags: the worker is plain JavaScript over the built `@gramwatt/shared`, and a
      // parent's loader flags (`--conditions development` in tests, `-r @swc-node/register` in dev) would point it at
      // TypeScript sources or load a compiler it does not need.
      execArgv: [],
      // Threads start on the first solve and end after `threadIdleMs` idle: a server that never plans holds none.
      minThreads: 0,
      maxThreads: this.config.workerThreads,
      idleTimeout: this.config.threadIdleMs,
      // Admission is counted here (see `admit`), so the pool's own queue never refuses.
      maxQueue: Infinity,
    });
  }

  /** Solves a whole plan (optimum, and swaps and gram prices when `withExtras`). */
  plan(input: PlanningInput, withExtras = true): Promise<SolverRun<PlanSolverValues['plan']>> {
    const deadlineMs = Date.now() + this.config.timeLimitMs;
    return this.run<PlanSolverValues['plan']>({ kind: 'plan', input, deadlineMs, withExtras });
  }

  /** Simulates a hand-picked kit and finds the changes that shave grams. */
  check(input: PlanningInput, selection: KitSelection): Promise<SolverRun<PlanSolverValues['check']>> {
    // The shaves are looked for within the check's own limit, so a large kit answers with those found, not a 422.
    const deadlineMs = Date.now() + this.config.checkTimeLimitMs;
    return this.run<PlanSolverValues['check']>({ kind: 'check', input, selection, deadlineMs });
  }

  /** Simulates a kit (the chosen kit): its lines with grams and its evaluation. */
  evaluate(input: PlanningInput, selection: KitSelection): Promise<SolverRun<PlanSolverValues['evaluate']>> {
    return this.run<PlanSolverValues['evaluate']>({ kind: 'evaluate', input, selection });
  }

  /**
   * Starts a solver thread and plans an invented trip on it (`warmUpPlanner`), so a hiker's first plan finds the
   * planner loaded and compiled: unless warm-up is off (PLAN_WARM_UP), a task is running or waiting (its thread is
   * warm by the time it ends), or a thread was used within half its idle time. Resolves to the warmed thread's id, or
   * undefined when none was warmed. A failure is logged, never thrown: a plan then starts its thread as before.
   */
  warmUp(): Promise<number | undefined> {
    if (this.warming) return this.warming;
    const recentlyUsed = performance.now() - this.lastUsedMs < this.config.threadIdleMs / 2;
    if (!this.config.warmUp || this.inFlight > 0 || recentlyUsed) return Promise.resolve(undefined);
    const startedMs = performance.now();
    this.warming = this.pool
      .run({ kind: 'warm-up' })
      .then(
        (answer) => {
          this.logger.log(
            `Solver thread ${answer.threadId} warmed up in ${Math.round(performance.now() - startedMs)} ms`,
          );
          return answer.threadId;
        },
        (error: unknown) => {
          if (this.closing) return undefined;
          this.logger.warn(`Solver warm-up failed: ${errorMessage(error)}`);
          return undefined;
        },
      )
      .finally(() => {
        this.lastUsedMs = performance.now();
        this.warming = undefined;
      });
    return this.warming;
  }

  /** Whether a warm-up is running now. */
  get warmingUp(): boolean {
    return this.warming !== undefined;
  }

  /** Warms a thread as the server starts (not awaited: the server answers meanwhile). */
  onApplicationBootstrap(): void {
    void this.warmUp();
  }

  /** Tasks running or waiting now. */
  get load(): number {
    return this.inFlight;
  }

  async onModuleDestroy(): Promise<void> {
    this.closing = true;
    await this.pool.destroy();
  }

  private async run<V>(task: PlanSolverTask): Promise<SolverRun<V>> {
    this.admit();
    const startedMs = performance.now();
    try {
      const signal = AbortSignal.timeout(this.config.timeLimitMs + this.config.stopGraceMs);
      let answer: PlanSolverAnswer;
      try {
        answer = await this.pool.run(task, { signal });
      } catch (error) {
        if (signal.aborted) throw this.timedOut(task.kind);
        throw error;
      }
      // A selection the input does not hold (the service checks first; this is the engine's own word on it).
      if (answer.kind === 'input-error') throw new PlanningInputError(answer.path, answer.message);
      return {
        value: answer.value as V,
        threadId: answer.threadId,
        durationMs: Math.round(performance.now() - startedMs),
      };
    } finally {
      this.inFlight -= 1;
      this.lastUsedMs = performance.now();
    }
  }

  private admit(): void {
    if (this.inFlight >= this.config.workerThreads + this.config.queueMax) {
      throw new PlanSolverBusyException(this.config.retryAfterS);
    }
    this.inFlight += 1;
  }

  private timedOut(kind: PlanSolverTask['kind']): UnprocessableEntityException {
    const seconds = (this.config.timeLimitMs + this.config.stopGraceMs) / 1000;
    const what = kind === 'plan' ? 'No kit could be verified' : 'This kit could not be simulated';
    return new UnprocessableEntityException(
      `${what} within ${seconds} s: try fewer items, a shorter trip, or again when the planner is less busy`,
    );
  }
}
