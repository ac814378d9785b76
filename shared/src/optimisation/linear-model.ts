/**
 * A solver-neutral mixed-integer linear model: named columns, rows with lower/upper bounds, binaries. One builder
 * writes it; back ends translate it (javascript-lp-solver at run time, CPLEX LP text for the highs cross-check), and
 * every returned solution is checked against it here, because a solver can return NaN or a point outside the rows on a
 * badly scaled model.
 */

/** One row: `lower ≤ Σ coef·column ≤ upper` (either bound may be absent). */
export interface LinearRow {
  name: string;
  terms: readonly (readonly [column: string, coefficient: number])[];
  lower?: number;
  upper?: number;
}

/** A model to minimise or maximise `Σ objective[column]·column`; every column is ≥ 0. */
export interface LinearModel {
  sense: 'min' | 'max';
  objective: Readonly<Record<string, number>>;
  /** Every column, in a stable order. */
  columns: readonly string[];
  /** Columns restricted to 0 or 1. */
  binaries: ReadonlySet<string>;
  /** Upper bounds of continuous columns. */
  upperBounds: Readonly<Record<string, number>>;
  rows: readonly LinearRow[];
}

/** A solver's answer for a model. */
export type LinearSolution =
  | {
      status: 'optimal';
      objective: number;
      values: ReadonlyMap<string, number>;
      /** False when the solver stopped on its timeout: the point is feasible but may not be optimal. */
      proven: boolean;
      /** When not proven: a lower bound on the objective of every point, if the solver knows one. */
      lowerBound?: number;
    }
  | { status: 'infeasible' }
  | {
      status: 'failed';
      reason: string;
      /** The rounded point that broke a row, when the solver returned one (never to be trusted as an optimum). */
      brokenValues?: ReadonlyMap<string, number>;
    };

/** Absolute tolerance (in the model's scaled units) for a row or bound to count as met. */
export const rowToleranceScaled = 1e-6;

/**
 * Checks a point against every row, bound and binary of the model; returns the first violation or null.
 * @example checkSolution(model, values) // null when every row holds
 */
export function checkSolution(
  model: LinearModel,
  values: ReadonlyMap<string, number>,
  tolerance = rowToleranceScaled,
): string | null {
  for (const column of model.columns) {
    const v = values.get(column) ?? 0;
    if (!Number.isFinite(v)) return `column ${column} is ${v}`;
    if (v < -tolerance) return `column ${column} = ${v} < 0`;
    if (model.binaries.has(column) && Math.min(Math.abs(v), Math.abs(v - 1)) > 1e-6) return `binary ${column} = ${v}`;
    const ub = model.upperBounds[column];
    if (ub !== undefined && v > ub + tolerance) return `column ${column} = ${v} above ${ub}`;
  }
  for (const row of model.rows) {
    let sum = 0;
    for (const [column, coefficient] of row.terms) sum += coefficient * (values.get(column) ?? 0);
    const scale = Math.max(1, Math.abs(row.lower ?? 0), Math.abs(row.upper ?? 0));
    if (row.lower !== undefined && sum < row.lower - tolerance * scale) return `row ${row.name}: ${sum} < ${row.lower}`;
    if (row.upper !== undefined && sum > row.upper + tolerance * scale) return `row ${row.name}: ${sum} > ${row.upper}`;
  }
  return null;
}

/**
 * Value of the objective at a point.
 * @example objectiveValue({ objective: { x: 2 } } as LinearModel, new Map([['x', 3]])) // 6
 */
export function objectiveValue(model: Pick<LinearModel, 'objective'>, values: ReadonlyMap<string, number>): number {
  let sum = 0;
  for (const [column, coefficient] of Object.entries(model.objective)) sum += coefficient * (values.get(column) ?? 0);
  return sum;
}

/** A back end: solves a model, synchronously. */
export type LinearSolver = (model: LinearModel, options: LinearSolveOptions) => LinearSolution;

/** Options of one solve. */
export interface LinearSolveOptions {
  timeoutMs: number;
  /** The caller's clock in ms, used only to tell whether the solver stopped on its timeout. */
  now: () => number;
  /**
   * Sets auxiliary continuous columns from the binaries of the rounded point before it is checked (the master's path
   * columns, see `completeMasterColumns`). Absent: the solver's values are checked as they are.
   */
  complete?: (values: Map<string, number>) => void;
}
