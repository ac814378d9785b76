import Papa from 'papaparse';
import type { LockerItemInput } from '../schemas/locker.js';
import type { OutputPort } from '../schemas/ports.js';
import { guardText, writeOutputPortsCell } from './cells.js';
import { type LockerCsvColumn, lockerCsvColumns, lockerCsvHeader } from './columns.js';

/** What an export needs of an item: the fields an import gives back. */
export type LockerCsvItem = Pick<LockerItemInput, 'name' | 'notes' | 'countOwned' | 'spec'>;

function valueAt(item: LockerCsvItem, path: readonly string[]): unknown {
  let node: unknown = item;
  for (const key of path) {
    if (typeof node !== 'object' || node === null) return undefined;
    node = (node as Record<string, unknown>)[key];
  }
  return node;
}

function writeCell(item: LockerCsvItem, column: LockerCsvColumn): string {
  if (!column.kinds.includes(item.spec.kind)) return '';
  const value = valueAt(item, column.path);
  if (value === undefined || value === null) return '';
  switch (column.type) {
    case 'output-ports':
      return writeOutputPortsCell(value as OutputPort[]);
    case 'text':
    case 'notes':
      return guardText(String(value));
    case 'boolean':
      return value ? 'true' : 'false';
    case 'number':
      // String() gives the shortest text that reads back as the same double (ECMAScript Number::toString).
      return String(value);
  }
}

/**
 * Writes a locker as CSV: a UTF-8 byte-order mark (so spreadsheets pick UTF-8), the full header, one row per
 * item, `,` separated, `.` decimals, CRLF line ends (RFC 4180). Reading the text back with `readLockerCsv`
 * gives the same items.
 *
 * @example
 * writeLockerCsv([{ name: 'Short C', notes: '', countOwned: 2,
 *   spec: { kind: 'lead', fromConnector: 'usb-a', toConnector: 'usb-c', lengthM: 0.3, massG: 15 } }]);
 * // → '\uFEFFkind,name,count_owned,mass_g,notes,...\r\nlead,Short C,2,15,,...\r\n'
 */
export function writeLockerCsv(items: readonly LockerCsvItem[]): string {
  // Papa.unparse adds a blank line after a header with no rows; an empty locker is the header alone.
  if (items.length === 0) return `\uFEFF${lockerCsvHeader.join(',')}\r\n`;
  const data = items.map((item) => lockerCsvColumns.map((column) => writeCell(item, column)));
  const body = Papa.unparse({ fields: [...lockerCsvHeader], data }, { delimiter: ',', newline: '\r\n', quotes: false });
  return `\uFEFF${body}\r\n`;
}
