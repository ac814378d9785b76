import * as lpModule from 'javascript-lp-solver';
import type { Model as JsLpModel, SolveResult } from 'javascript-lp-solver';
import {
  checkSolution,
  objectiveValue,
  type LinearModel,
  type LinearSolution,
  type LinearSolveOptions,
} from './linear-model.js';

/** The solver object. The package's typings are read as CommonJS under NodeNext, its ESM build exports a default. */
interface JsLpApi {
  Solve(model: JsLpModel): unknown;
}
const solver: JsLpApi = (lpModule as unknown as { default?: JsLpApi }).default ?? (lpModule as unknown as JsLpApi);

/** Name of the objective attribute in the javascript-lp-solver JSON model (never a row name). */
const objectiveKey = '__objective';

/**
 * Translates a `LinearModel` into javascript-lp-solver's JSON model. Continuous upper bounds become rows (the library
 * has no column bounds); binaries use its `binaries` map, which adds the `≤ 1` row itself.
 * @example toJsLpModel(model).optimize // '__objective'
 */
export function toJsLpModel(model: LinearModel, timeoutMs: number): JsLpModel {
  const constraints: JsLpModel['constraints'] = {};
  const variables: Record<string, Record<string, number>> = {};
  for (const column of model.columns) variables[column] = {};
  for (const [column, coefficient] of Object.entries(model.objective)) {
    const v = variables[column];
    if (v) v[objectiveKey] = coefficient;
  }
  for (const row of model.rows) {
    if (row.lower !== undefined && row.upper !== undefined && row.lower === row.upper)
      constraints[row.name] = { equal: row.lower };
    else
      constraints[row.name] = {
        ...(row.lower !== undefined ? { min: row.lower } : {}),
        ...(row.upper !== undefined ? { max: row.upper } : {}),
      };
    for (const [column, coefficient] of row.terms) {
      const v = variables[column];
      if (v) v[row.name] = (v[row.name] ?? 0) + coefficient;
    }
  }
  for (const [column, ub] of Object.entries(model.upperBounds)) {
    const name = `__ub_${column}`;
    constraints[name] = { max: ub };
    const v = variables[column];
    if (v) v[name] = 1;
  }
  const binaries: Record<string, 1> = {};
  for (const column of model.binaries) binaries[column] = 1;
  return {
    optimize: objectiveKey,
    opType: model.sense,
    constraints,
    variables,
    binaries,
    options: { timeout: timeoutMs, tolerance: 0, exitOnCycles: true },
  };
}

/**
 * Solves a `LinearModel` with javascript-lp-solver and checks the answer against every row: a point that breaks a
 * row, a non-finite value or a fractional binary is reported as `failed`, never passed on.
 * @example solveWithJsLp(model, { timeoutMs: 1000, now: () => 0 }).status // 'optimal'
 */
export function solveWithJsLp(model: LinearModel, options: LinearSolveOptions): LinearSolution {
  // A row with no terms is decided already (javascript-lp-solver would ignore it): e.g. a need with no path, or a cut
  // that excludes every kit.
  for (const row of model.rows) {
    if (row.terms.length === 0 && ((row.lower ?? 0) > 0 || (row.upper ?? 0) < 0)) return { status: 'infeasible' };
  }
  const startMs = options.now();
  let result: SolveResult;
  try {
    result = solver.Solve(toJsLpModel(model, Math.max(1, Math.round(options.timeoutMs)))) as SolveResult;
  } catch (error) {
    return { status: 'failed', reason: `solver threw: ${String(error)}` };
  }
  const elapsedMs = options.now() - startMs;
  if (!result.feasible) return { status: 'infeasible' };
  if (result.bounded === false) return { status: 'failed', reason: 'solver reports the model unbounded' };
  const values = new Map<string, number>();
  for (const column of model.columns) {
    const raw = result[column];
    const v = typeof raw === 'number' ? raw : 0;
    values.set(column, model.binaries.has(column) ? Math.round(v) : v);
  }
  options.complete?.(values);
  // Check the rounded point: binaries are used as integers downstream, so the rows must hold for them.
  const violation = checkSolution(model, values);
  if (violation)
    return { status: 'failed', reason: `solver answer breaks the model: ${violation}`, brokenValues: values };
  return {
    status: 'optimal',
    objective: objectiveValue(model, values),
    values,
    proven: elapsedMs < 0.98 * options.timeoutMs,
  };
}
