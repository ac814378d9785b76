// A stand-in for the plan solver's worker thread that holds its thread for a while before solving, so a test can
// fill every thread and queue place, or pass the time limit, without depending on how fast the engine is. The
// solve itself is the real worker's.
import solve from '../../workers/plan-solver.worker.mjs';

/** How long each task holds its thread before solving, ms: far longer than a test needs to send a few requests. */
const holdMs = 2000;

export default function heldSolve(task) {
  // Blocks this worker thread only (never the server's event loop), as a long solve would.
  Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, holdMs);
  return solve(task);
}
