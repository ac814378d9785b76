/**
 * Plans bench (`npm run bench`, after the engine's): the whole plan of the invented high route (optimum, swaps and
 * gram prices) on one thread; the same plan over HTTP on a fresh solver thread, on a warm one and after 70 s idle; and
 * the health route's latency over HTTP while 4 such plans are solved by the server's worker threads, against its
 * latency at rest. Prints medians and 95th percentiles; asserts nothing.
 */
import type { AddressInfo } from 'node:net';
import { ConfigService } from '@nestjs/config';
import { planTrip } from '@gramwatt/shared';
import { PlanningInputBuilder } from '../src/plans/planning-input.builder';
import { type PlansConfig, plansConfigKey } from '../src/plans/plans.config';
import { highRoute } from '../test/support/plan-fixtures';
import { startTestApp } from '../test/support/test-app';
import { signedInHiker } from '../test/support/trip-fixtures';

/** Concurrent plans while the health route is timed (the figure). */
const concurrentPlans = 4;
/** Health requests at rest. */
const restSamples = 200;
/** Whole plans timed on one thread. */
const planRuns = 5;
/**
 * The pause before the last plan over HTTP, ms: longer than the minute after which an idle solver thread was first
 * ended (see `PLAN_THREAD_IDLE_MS`), so the figure shows whether a hiker's plan after a pause of thought runs warm.
 */
const idlePauseMs = 70_000;

function quantile(samplesMs: number[], q: number): number {
  const sorted = [...samplesMs].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1))] ?? Number.NaN;
}

function report(name: string, samplesMs: number[]): void {
  const fmt = (ms: number) => (ms < 10 ? ms.toFixed(2) : ms.toFixed(0)).padStart(7);
  console.log(
    `${name.padEnd(72)} median ${fmt(quantile(samplesMs, 0.5))} ms   p95 ${fmt(quantile(samplesMs, 0.95))} ms   (${samplesMs.length} runs)`,
  );
}

async function timed(run: () => Promise<unknown>): Promise<number> {
  const t0 = performance.now();
  await run();
  return performance.now() - t0;
}

async function main(): Promise<void> {
  // Room for every plan at once: a refused plan would not load the threads.
  const t = await startTestApp({ env: { PLAN_QUEUE_MAX: String(concurrentPlans) } });
  try {
    await t.app.listen(0, '127.0.0.1');
    const { port } = t.app.getHttpServer().address() as AddressInfo;
    const base = `http://127.0.0.1:${port}/api`;
    const leader = await signedInHiker(t);
    const { trip } = await highRoute(t, leader);

    const { input } = await t.app.get(PlanningInputBuilder).forTrip(trip.id);
    const planMs: number[] = [];
    let answer = '';
    for (let i = 0; i < planRuns + 1; i += 1) {
      const t0 = performance.now();
      const result = planTrip(input, { now: Date.now });
      // The first run warms the JIT and is not counted.
      if (i > 0) planMs.push(performance.now() - t0);
      answer = `${result.status}, ${result.kit?.massG ?? '-'} g, ${result.swaps.length} swaps, ${result.gramPrices.length} gram prices; optimum ${result.stats.optimumMs} ms of ${result.stats.totalMs} ms`;
    }
    report(
      `full plan (optimum + swaps + gram prices), high route: ${input.gear.length} items, ${input.devices.length} devices, 6 days`,
      planMs,
    );
    console.log(`  → ${answer}`);

    const health = () => fetch(`${base}/health`).then((res) => res.arrayBuffer());
    for (let i = 0; i < 20; i += 1) await health();
    const restMs: number[] = [];
    for (let i = 0; i < restSamples; i += 1) restMs.push(await timed(health));
    report('GET /api/health at rest', restMs);

    const auth = leader.auth.Authorization;
    const requestPlan = () =>
      fetch(`${base}/trips/${trip.id}/plans`, {
        method: 'POST',
        headers: { Authorization: auth, 'Content-Type': 'application/json' },
        body: '{}',
      });
    const postPlan = () =>
      requestPlan().then(async (res) => {
        await res.arrayBuffer();
        if (res.status !== 201) throw new Error(`POST /plans answered ${res.status}`);
      });
    // What a hiker waits for: the first plan starts a solver thread, which compiles the engine; the next ones run warm;
    // then one after a pause of thought.
    const firstMs = await timed(postPlan);
    const warmMs: number[] = [];
    for (let i = 0; i < planRuns; i += 1) warmMs.push(await timed(postPlan));
    await new Promise((done) => setTimeout(done, idlePauseMs));
    const afterPauseMs = await timed(postPlan);
    report('POST /api/trips/:id/plans, warm thread', warmMs);
    console.log(
      `  → the first on a fresh thread ${firstMs.toFixed(0)} ms; after ${idlePauseMs / 1000} s idle ${afterPauseMs.toFixed(0)} ms`,
    );

    let running = concurrentPlans;
    const started = performance.now();
    const plans = Array.from({ length: concurrentPlans }, () =>
      requestPlan().then(async (res) => {
        await res.arrayBuffer();
        running -= 1;
        return { status: res.status, ms: performance.now() - started };
      }),
    );
    const busyMs: number[] = [];
    while (running > 0) busyMs.push(await timed(health));
    const answers = await Promise.all(plans);
    report(`GET /api/health while ${concurrentPlans} plans are solved`, busyMs);
    const { workerThreads } = t.app.get(ConfigService).getOrThrow<PlansConfig>(plansConfigKey);
    console.log(
      `  → plans answered ${answers.map((a) => a.status).join(', ')} after ${answers.map((a) => (a.ms / 1000).toFixed(1)).join(', ')} s on ${workerThreads} worker thread(s)`,
    );
  } finally {
    await t.close();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
