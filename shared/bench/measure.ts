/**
 * A tiny benchmark harness that prints the median and the 95th percentile of repeated runs. The figures are
 * for people reading `npm run bench`; nothing asserts on them (speed is never a test verdict here).
 */
export interface MeasureOptions {
  /** Untimed runs first, so the JIT has warmed up (default 20). */
  warmupRuns?: number;
  /** Timed runs (default 200). */
  runs?: number;
  /** Stop timing after this many milliseconds even if fewer runs were made (default 20 s). */
  budgetMs?: number;
}

export interface Measurement {
  name: string;
  runs: number;
  medianMs: number;
  p95Ms: number;
  minMs: number;
}

function quantile(sortedMs: number[], q: number): number {
  const index = Math.min(sortedMs.length - 1, Math.max(0, Math.ceil(q * sortedMs.length) - 1));
  return sortedMs[index] ?? Number.NaN;
}

/** Times `run` repeatedly and prints one line: name, median, p95, min, runs. */
export function measure(name: string, run: () => unknown, options: MeasureOptions = {}): Measurement {
  const { warmupRuns = 20, runs = 200, budgetMs = 20_000 } = options;
  for (let i = 0; i < warmupRuns; i += 1) run();
  const samplesMs: number[] = [];
  const startedMs = performance.now();
  while (samplesMs.length < runs && performance.now() - startedMs < budgetMs) {
    const t0 = performance.now();
    run();
    samplesMs.push(performance.now() - t0);
  }
  samplesMs.sort((a, b) => a - b);
  const result: Measurement = {
    name,
    runs: samplesMs.length,
    medianMs: quantile(samplesMs, 0.5),
    p95Ms: quantile(samplesMs, 0.95),
    minMs: samplesMs[0] ?? Number.NaN,
  };
  const fmt = (ms: number) => (ms < 10 ? ms.toFixed(3) : ms.toFixed(1)).padStart(9);
  console.log(
    `${name.padEnd(72)} median ${fmt(result.medianMs)} ms   p95 ${fmt(result.p95Ms)} ms   (${result.runs} runs)`,
  );
  return result;
}
