import type { LinearModel } from './linear-model.js';

/** Terms per line in the LP text (the CPLEX LP format limits line length). */
const termsPerLine = 8;

function formatTerms(terms: readonly (readonly [string, number])[]): string {
  if (terms.length === 0) return '0 __zero';
  const parts = terms.map(([column, c], i) => {
    const sign = c < 0 ? '-' : i === 0 ? '' : '+';
    return `${sign} ${Math.abs(c)} ${column}`.trim();
  });
  const lines: string[] = [];
  for (let i = 0; i < parts.length; i += termsPerLine) lines.push(parts.slice(i, i + termsPerLine).join(' '));
  return lines.join('\n   ');
}

/**
 * Writes a `LinearModel` as CPLEX LP text (sections Minimize/Maximize, Subject To, Bounds, Binary), the input format
 * of the HiGHS solver used as a cross-check in tests. Ranged rows are written as two rows.
 * Source: the CPLEX LP file format as read by HiGHS (HiGHS documentation, "LP file format").
 * @example toLpText(model).startsWith('Minimize') // true
 */
export function toLpText(model: LinearModel): string {
  const out: string[] = [model.sense === 'min' ? 'Minimize' : 'Maximize'];
  const objectiveTerms = Object.entries(model.objective).filter(([, c]) => c !== 0);
  out.push(` obj: ${formatTerms(objectiveTerms)}`);
  out.push('Subject To');
  const usesZero = objectiveTerms.length === 0 || model.rows.some((r) => r.terms.length === 0);
  model.rows.forEach((row, i) => {
    const body = formatTerms(row.terms);
    if (row.lower !== undefined && row.upper !== undefined && row.lower === row.upper)
      out.push(` r${i}: ${body} = ${row.lower}`);
    else {
      if (row.lower !== undefined) out.push(` r${i}l: ${body} >= ${row.lower}`);
      if (row.upper !== undefined) out.push(` r${i}u: ${body} <= ${row.upper}`);
    }
  });
  out.push('Bounds');
  for (const column of model.columns) {
    const ub = model.upperBounds[column];
    if (ub !== undefined && !model.binaries.has(column)) out.push(` 0 <= ${column} <= ${ub}`);
  }
  if (usesZero) out.push(' __zero = 0');
  if (model.binaries.size > 0) {
    out.push('Binary');
    const names = [...model.binaries];
    for (let i = 0; i < names.length; i += termsPerLine) out.push(` ${names.slice(i, i + termsPerLine).join(' ')}`);
  }
  out.push('End');
  return out.join('\n');
}
