import Papa from 'papaparse';
import type { z } from 'zod';
import {
  type LockerImportIssue,
  type LockerItemInput,
  type LockerItemKind,
  lockerItemInputSchema,
  lockerItemKinds,
} from '../schemas/locker.js';
import { type LockerCsvDelimiter, readBooleanCell, readNumberCell, readOutputPortsCell, unguardText } from './cells.js';
import {
  type LockerCsvColumn,
  columnForPath,
  lockerCsvColumns,
  lockerCsvColumnsByName,
  lockerPanelTypes,
} from './columns.js';

/** Largest import file, bytes (1 MiB): a 2,000-row locker with notes fits well within it. */
export const maxLockerCsvBytes = 1_048_576;
/** Most item rows one import takes. */
export const maxLockerCsvRows = 2000;
/** Most problems one report lists; a last line counts the rest. */
export const maxLockerCsvIssues = 500;

/** A row that passed every check, with its spreadsheet row number (header = 1). */
export interface LockerCsvRow {
  row: number;
  item: LockerItemInput;
}

/** The outcome of reading a locker CSV. `ok` is true only when the report is empty and there is at least one row. */
export interface LockerCsvReadResult {
  ok: boolean;
  /** The separator found in the header. */
  delimiter: LockerCsvDelimiter;
  /** Data rows in the file (blank lines not counted). */
  rowCount: number;
  /** The good rows (all of them only when `ok`). */
  rows: LockerCsvRow[];
  /** Every problem found, row by row. */
  report: LockerImportIssue[];
}

/** Options of {@link readLockerCsv}. */
export interface ReadLockerCsvOptions {
  /** Most data rows accepted (default {@link maxLockerCsvRows}). */
  maxRows?: number;
}

const byteOrderMark = '\uFEFF';

/**
 * Decodes an uploaded file as UTF-8 (a byte-order mark is allowed and dropped). `undefined` when the bytes
 * are not valid UTF-8.
 *
 * @example
 * decodeLockerCsv(new Uint8Array([0xef, 0xbb, 0xbf, 0x6b])); // → 'k'
 */
export function decodeLockerCsv(bytes: Uint8Array): string | undefined {
  try {
    // ignoreBOM: true keeps the mark in the text; readLockerCsv drops it, so text input behaves the same.
    return new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(bytes).replace(/^\uFEFF/, '');
  } catch {
    return undefined;
  }
}

/**
 * The field separator of a file: `;` when its first line has more semicolons than commas outside quotes, else `,`.
 *
 * @example
 * detectLockerCsvDelimiter('kind;name;mass_g\n'); // → ';'
 */
export function detectLockerCsvDelimiter(text: string): LockerCsvDelimiter {
  let commas = 0;
  let semicolons = 0;
  let quoted = false;
  for (const ch of text) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && (ch === '\n' || ch === '\r')) break;
    else if (!quoted && ch === ',') commas += 1;
    else if (!quoted && ch === ';') semicolons += 1;
  }
  return semicolons > commas ? ';' : ',';
}

/** Edit distance, for "did you mean" on unknown columns. */
function editDistance(a: string, b: string): number {
  const row = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i += 1) {
    let diagonal = row[0] ?? 0;
    row[0] = i;
    for (let j = 1; j <= b.length; j += 1) {
      const above = row[j] ?? 0;
      row[j] = Math.min(above + 1, (row[j - 1] ?? 0) + 1, diagonal + (a[i - 1] === b[j - 1] ? 0 : 1));
      diagonal = above;
    }
  }
  return row[b.length] ?? 0;
}

function unknownColumnMessage(name: string): string {
  let best: string | undefined;
  let bestDistance = 3;
  for (const c of lockerCsvColumns) {
    const d = editDistance(name, c.name);
    if (d < bestDistance) {
      best = c.name;
      bestDistance = d;
    }
  }
  return best
    ? `Unknown column "${name}" — did you mean "${best}"?`
    : `Unknown column "${name}" (see the list of locker CSV columns)`;
}

const isBlank = (cell: string | undefined) => cell === undefined || cell.trim() === '';

const kindArticle: Record<LockerItemKind, string> = {
  panel: 'A panel',
  bank: 'A bank',
  battery: 'A battery',
  converter: 'A converter',
  controller: 'A controller',
  lead: 'A lead',
  device: 'A device',
};

/** The kinds as a report lists them. */
const kindList = 'panel, bank, battery, converter, controller, lead or device';

function setPath(target: Record<string, unknown>, path: readonly string[], value: unknown): void {
  let node = target;
  path.slice(0, -1).forEach((key) => {
    const next = node[key];
    if (typeof next === 'object' && next !== null) {
      node = next as Record<string, unknown>;
    } else {
      const child: Record<string, unknown> = {};
      node[key] = child;
      node = child;
    }
  });
  const last = path[path.length - 1];
  if (last !== undefined) node[last] = value;
}

/** Ports are written only when their connector or captive cell says something. */
const portPaths = [
  ['spec', 'outputPort'],
  ['spec', 'inputPort'],
  ['spec', 'chargePort'],
  ['spec', 'port'],
] as const;

interface RowContext {
  rowNumber: number;
  cells: Map<LockerCsvColumn, string>;
  delimiter: LockerCsvDelimiter;
}

/** Checks and converts one data row: the item, or its problems. */
function readRow({ rowNumber, cells, delimiter }: RowContext): { item?: LockerItemInput; issues: LockerImportIssue[] } {
  const issues: LockerImportIssue[] = [];
  const issue = (column: string, message: string) => issues.push({ row: rowNumber, column, message });

  const kindColumn = lockerCsvColumnsByName.get('kind');
  const kindText = (kindColumn && cells.get(kindColumn)?.trim().toLowerCase()) ?? '';
  if (kindText === '') {
    issue('kind', `Give the kind: ${kindList}`);
    return { issues };
  }
  if (!(lockerItemKinds as readonly string[]).includes(kindText)) {
    issue('kind', `"${kindText}" is not a kind: ${kindList}`);
    return { issues };
  }
  const kind = kindText as LockerItemKind;
  const basisColumn = lockerCsvColumnsByName.get('use_basis');
  const basis = basisColumn ? cells.get(basisColumn)?.trim() : undefined;
  // An unknown panel type is the schema's to report; only a known one rules out the other type's columns.
  const panelTypeColumn = lockerCsvColumnsByName.get('panel_type');
  const panelTypeText = (panelTypeColumn && cells.get(panelTypeColumn)?.trim()) || panelTypeColumn?.blankMeans;
  const panelType = lockerPanelTypes.find((t) => t === panelTypeText);

  const input: Record<string, unknown> = { spec: { kind } };
  const givenPorts = new Set<string>();
  for (const column of lockerCsvColumns) {
    if (column.name === 'kind') continue;
    const cell = cells.get(column);
    // Notes keep whitespace exactly; elsewhere a blank cell means "not given".
    if (cell === undefined || (column.type === 'notes' ? cell === '' : isBlank(cell))) continue;
    if (!column.kinds.includes(kind)) {
      issue(column.name, `${column.name} does not apply to a ${kind}; leave it empty`);
      continue;
    }
    if (column.useBases && basis && !column.useBases.includes(basis)) {
      issue(
        column.name,
        `${column.name} is for use_basis ${column.useBases.join(' or ')}, not ${basis}; leave it empty`,
      );
      continue;
    }
    if (column.panelTypes && panelType && !column.panelTypes.includes(panelType)) {
      issue(
        column.name,
        `${column.name} is for panel_type ${column.panelTypes.join(' or ')}, not ${panelType}; leave it empty`,
      );
      continue;
    }
    const portPath = portPaths.find((p) => p.every((part, i) => column.path[i] === part));
    if (portPath) givenPorts.add(portPath.join('.'));
    switch (column.type) {
      case 'text':
        setPath(input, column.path, unguardText(cell.trim()));
        break;
      case 'notes':
        setPath(input, column.path, unguardText(cell));
        break;
      case 'number': {
        const n = readNumberCell(cell, delimiter);
        if (n.ok) setPath(input, column.path, n.value);
        else issue(column.name, n.message);
        break;
      }
      case 'boolean': {
        const b = readBooleanCell(cell);
        if (b.ok) setPath(input, column.path, b.value);
        else issue(column.name, b.message);
        break;
      }
      case 'output-ports': {
        const ports = readOutputPortsCell(cell, delimiter);
        if (ports.ok) setPath(input, column.path, ports.value);
        else issue(column.name, ports.message);
        break;
      }
    }
  }
  // Defaults an empty cell stands for: one owned, a usb panel, no captive cable on a port that is described.
  for (const column of lockerCsvColumns) {
    if (column.blankMeans === undefined || !column.kinds.includes(kind) || !isBlank(cells.get(column))) continue;
    const portPath = portPaths.find((p) => p.every((part, i) => column.path[i] === part));
    if (portPath && !givenPorts.has(portPath.join('.'))) continue;
    setPath(input, column.path, column.blankMeans);
  }
  if (issues.length > 0) return { issues };

  const parsed = lockerItemInputSchema.safeParse(input);
  if (parsed.success) return { item: parsed.data, issues };
  for (const zodIssue of parsed.error.issues) issues.push(describeIssue(zodIssue, kind, cells, rowNumber));
  return { issues };
}

/** A schema issue as a report line: its column, and "A panel needs rated_w" for a value that is missing. */
function describeIssue(
  zodIssue: z.core.$ZodIssue,
  kind: LockerItemKind,
  cells: Map<LockerCsvColumn, string>,
  row: number,
): LockerImportIssue {
  const column = columnForPath(zodIssue.path);
  const name = column?.name ?? '';
  const missing =
    column !== undefined &&
    isBlank(cells.get(column)) &&
    (zodIssue.code === 'invalid_type' || zodIssue.code === 'invalid_union' || zodIssue.code === 'invalid_value');
  if (missing) return { row, column: name, message: `${kindArticle[kind]} needs ${name}` };
  // An issue inside the ports cell: say which port.
  const portIndex = column?.type === 'output-ports' ? zodIssue.path[2] : undefined;
  const prefix = typeof portIndex === 'number' ? `Port ${portIndex + 1}: ` : '';
  return { row, column: name, message: `${prefix}${zodIssue.message}` };
}

/**
 * Reads a locker CSV (see the README's "Locker CSV"): the header is checked first (required `kind` and
 * `name`, no unknown or repeated columns), then every data row against the locker item schema. Nothing is
 * half-accepted: the caller writes `rows` only when `ok`. `,` or `;` separated (found from the header);
 * a leading byte-order mark is dropped; blank lines are skipped.
 *
 * @example
 * readLockerCsv('kind,name,from_connector,to_connector,length_m,mass_g\nlead,Short C,usb-a,usb-c,0.3,15\n');
 * // → { ok: true, delimiter: ',', rowCount: 1, rows: [{ row: 2, item: { name: 'Short C', ... } }], report: [] }
 */
export function readLockerCsv(text: string, options: ReadLockerCsvOptions = {}): LockerCsvReadResult {
  const maxRows = options.maxRows ?? maxLockerCsvRows;
  const source = text.startsWith(byteOrderMark) ? text.slice(1) : text;
  const delimiter = detectLockerCsvDelimiter(source);
  const empty = (message: string): LockerCsvReadResult => ({
    ok: false,
    delimiter,
    rowCount: 0,
    rows: [],
    report: [{ row: 1, column: '', message }],
  });
  if (source.trim() === '') return empty('The file is empty: it needs a header row and at least one item');

  const parsed = Papa.parse<string[]>(source, { delimiter, header: false, skipEmptyLines: false, quoteChar: '"' });
  const records = parsed.data;
  const header = (records[0] ?? []).map((h) => h.trim().toLowerCase());
  const dataRecords = records
    .slice(1)
    .map((cells, i) => ({ cells, rowNumber: i + 2 }))
    .filter((r) => !r.cells.every((c) => c.trim() === ''));

  const report: LockerImportIssue[] = [];
  for (const error of parsed.errors) {
    // Field counts are checked below; a broken quote is reported here.
    if (error.type === 'Quotes')
      report.push({ row: (error.row ?? 0) + 1, column: '', message: `Broken quotes: ${error.message}` });
  }

  // Header: every named column known, none twice, the required ones present.
  const positions = new Map<number, LockerCsvColumn>();
  const seen = new Set<string>();
  header.forEach((name, position) => {
    if (name === '') {
      if (dataRecords.some((r) => !isBlank(r.cells[position]))) {
        report.push({ row: 1, column: '', message: `Column ${position + 1} has values but no name in the header` });
      }
      return;
    }
    const column = lockerCsvColumnsByName.get(name);
    if (!column) {
      report.push({ row: 1, column: name, message: unknownColumnMessage(name) });
    } else if (seen.has(name)) {
      report.push({ row: 1, column: name, message: `Column "${name}" appears more than once` });
    } else {
      seen.add(name);
      positions.set(position, column);
    }
  });
  for (const column of lockerCsvColumns) {
    if (column.requiredInHeader && !seen.has(column.name)) {
      report.push({ row: 1, column: column.name, message: `The header needs a "${column.name}" column` });
    }
  }
  const rowCount = dataRecords.length;
  if (report.length > 0) return { ok: false, delimiter, rowCount, rows: [], report };
  if (rowCount === 0) return { ...empty('The file has a header but no items'), rowCount };
  if (rowCount > maxRows) {
    return {
      ok: false,
      delimiter,
      rowCount,
      rows: [],
      report: [
        {
          row: dataRecords[maxRows]?.rowNumber ?? maxRows + 2,
          column: '',
          message: `The file has ${rowCount.toLocaleString('en')} items; at most ${maxRows.toLocaleString('en')} can be imported at once`,
        },
      ],
    };
  }

  const rows: LockerCsvRow[] = [];
  for (const { cells, rowNumber } of dataRecords) {
    if (cells.length > header.length) {
      report.push({
        row: rowNumber,
        column: '',
        message: `This row has ${cells.length} cells; the header has ${header.length}`,
      });
      continue;
    }
    const byColumn = new Map<LockerCsvColumn, string>();
    positions.forEach((column, position) => {
      const cell = cells[position];
      if (cell !== undefined) byColumn.set(column, cell);
    });
    const { item, issues } = readRow({ rowNumber, cells: byColumn, delimiter });
    report.push(...issues);
    if (item) rows.push({ row: rowNumber, item });
  }
  const capped =
    report.length > maxLockerCsvIssues
      ? [
          ...report.slice(0, maxLockerCsvIssues),
          {
            row: report[maxLockerCsvIssues]?.row ?? 0,
            column: '',
            message: `…and ${report.length - maxLockerCsvIssues} more problems`,
          },
        ]
      : report;
  return { ok: capped.length === 0, delimiter, rowCount, rows, report: capped };
}
