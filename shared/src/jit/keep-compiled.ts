/**
 * Holds the latest instance of the closures a hot function makes per call, so the JavaScript engine keeps their
 * compiled code between plans.
 *
 * Why: V8 (Node 20) keeps a closure's optimised code strongly only from the closures that run it; the copy it shares
 * with the closure's later instances is held weakly. Closures made per call — a search's branching steps, the daily
 * model's forward pass, a simulation's top-up — are all gone when no plan is running, so a full (mark-compact)
 * collection drops their code and the next plan waits for it to be compiled again. Measured on the 50-item bench
 * plan (seed 50, 14 nights), 60 plans in one process: a full collection every 6–8 plans, and each plan that met one
 * ran 180–245 ms against a 64 ms median, with 140–190 functions compiled again (about 550 ms of compiler time).
 * Holding the latest instances, those plans ran 82–135 ms with 43–61 compiled again. `--trace-opt --trace-gc`
 * shows it; the V8 flags for code and bytecode flushing do not change it.
 *
 * What it costs: each site keeps its last closures and what they reach (one plan's working data at most) until the
 * next call replaces them.
 */
const latestBySite = new Map<string, readonly unknown[]>();

/**
 * Keeps `closures` as `site`'s latest instances (replacing the ones before).
 * @example keepCompiled('energy-cuts', runSky, scaledValue)
 */
export function keepCompiled(site: string, ...closures: readonly unknown[]): void {
  latestBySite.set(site, closures);
}

/**
 * Lets `sites`' closures go (a site whose closures reach much memory lets them go rather than hold it while idle).
 * @example releaseCompiled('master search')
 */
export function releaseCompiled(...sites: readonly string[]): void {
  for (const site of sites) latestBySite.delete(site);
}
