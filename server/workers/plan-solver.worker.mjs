// The plan solver's worker thread: plans, hand checks and kit evaluations run here, off the server's event loop.
// A plain ES module on purpose: it runs unchanged beside the server's sources (tests) and its build (dist), and
// takes the built `@gramwatt/shared`. The task and answer shapes are `PlanSolverTask` and `PlanSolverAnswer` in
// `src/plans/plan-solver-task.ts`.
import { threadId } from 'node:worker_threads';
import {
  checkKit,
  evaluateKit,
  partyCarriers,
  planKit,
  planningContext,
  planParty,
  planTrip,
  PlanningInputError,
  warmUpPlanner,
} from '@gramwatt/shared';

/** Runs one task; a selection the input does not hold comes back as an `input-error` (an Error loses its path between threads). */
export default function solve(task) {
  try {
    return { kind: 'done', threadId, value: run(task) };
  } catch (error) {
    if (error instanceof PlanningInputError)
      return { kind: 'input-error', threadId, path: error.path, message: error.message };
    throw error;
  }
}

function run(task) {
  switch (task.kind) {
    case 'plan': {
      // The budget is what is left of the request's time limit after its wait in the queue (same process, same clock).
      const options = {
        now: Date.now,
        timeBudgetMs: Math.max(1, task.deadlineMs - Date.now()),
        withExtras: task.withExtras,
      };
      // A party's trip: the kit is shared out among the carriers within their own gram limits.
      return task.input.party ? planParty(task.input, task.input.party, options) : planTrip(task.input, options);
    }
    case 'check':
      // A party's check carries who carries what (checkKit splits the kit with the context it already built).
      // The shaves are judged, biggest saving first, until the request's deadline; the rest are counted as untried.
      return checkKit(task.input, task.selection, { deadlineMs: task.deadlineMs, now: Date.now });
    case 'evaluate': {
      const context = planningContext(task.input);
      const counts = new Map(task.selection.map((line) => [line.itemId, line.count]));
      const kit = planKit(context, counts);
      const party = task.input.party;
      return {
        kit: party ? { ...kit, carriers: partyCarriers(context, party, counts) } : kit,
        evaluation: evaluateKit(context, counts),
      };
    }
    case 'warm-up':
      // A new thread's first task: the planner loaded and compiled before a hiker's first plan (see PlanSolver.warmUp).
      return { massG: warmUpPlanner(Date.now) };
    default:
      throw new Error(`Unknown plan solver task ${String(task.kind)}`);
  }
}
