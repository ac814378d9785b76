import type { OutputPort } from '../schemas/ports.js';

/**
 * Reading and writing single locker-CSV cells: numbers (with decimal commas in `;` files), booleans, the
 * compact bank-port cell and the spreadsheet-formula guard on text.
 */

/** A cell read into a value, or the reason it could not be. */
export type CellResult<T> = { ok: true; value: T } | { ok: false; message: string };

/** The two field separators an import accepts. */
export type LockerCsvDelimiter = ',' | ';';

const plainNumber = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/**
 * Reads a decimal number. `.` is the decimal mark; in a `;`-separated file a single `,` is one too
 * (`2,4` → 2.4). Thousands separators, units and spaces inside the number are refused.
 *
 * @example
 * readNumberCell('2,4', ';'); // → { ok: true, value: 2.4 }
 * readNumberCell('2,4', ','); // → { ok: false, message: 'Use . for decimals in a comma-separated file: "2,4"' }
 */
export function readNumberCell(cell: string, delimiter: LockerCsvDelimiter): CellResult<number> {
  const text = cell.trim();
  let normalised = text;
  if (text.includes(',')) {
    if (delimiter === ',') return { ok: false, message: `Use . for decimals in a comma-separated file: "${text}"` };
    if (text.includes('.') || text.indexOf(',') !== text.lastIndexOf(',')) {
      return { ok: false, message: `Not a number (no thousands separators): "${text}"` };
    }
    normalised = text.replace(',', '.');
  }
  if (!plainNumber.test(normalised)) return { ok: false, message: `Not a number: "${text}"` };
  const value = Number(normalised);
  if (!Number.isFinite(value)) return { ok: false, message: `Number out of range: "${text}"` };
  return { ok: true, value };
}

const trueWords = new Set(['true', 'yes', 'y', '1']);
const falseWords = new Set(['false', 'no', 'n', '0']);

/**
 * Reads a boolean: true/yes/y/1 or false/no/n/0, any case.
 *
 * @example
 * readBooleanCell('Yes'); // → { ok: true, value: true }
 */
export function readBooleanCell(cell: string): CellResult<boolean> {
  const word = cell.trim().toLowerCase();
  if (trueWords.has(word)) return { ok: true, value: true };
  if (falseWords.has(word)) return { ok: true, value: false };
  return { ok: false, message: `Write true or false, not "${cell.trim()}"` };
}

/** Separates the ports of a bank in the `output_ports` cell (neither CSV separator, so no quoting is needed). */
export const outputPortSeparator = '|';

/** An output port as read from a cell, before the schema checks its values. */
export interface OutputPortCell {
  connector: string;
  volts: number;
  maxA: number;
  usbPdVolts?: number[];
  captiveCable: boolean;
}

/**
 * Reads the compact `output_ports` cell: ports split by `|`, each `connector:volts:max_a` followed by any of
 * `:pd=9/12/15` (the USB PD voltages offered) and `:captive` (a fixed cable). Numbers follow
 * {@link readNumberCell}.
 *
 * @example
 * readOutputPortsCell('usb-a:5:2.4|usb-c:5:3:pd=9/12', ',');
 * // → { ok: true, value: [{ connector: 'usb-a', volts: 5, maxA: 2.4, captiveCable: false },
 * //                       { connector: 'usb-c', volts: 5, maxA: 3, usbPdVolts: [9, 12], captiveCable: false }] }
 */
export function readOutputPortsCell(cell: string, delimiter: LockerCsvDelimiter): CellResult<OutputPortCell[]> {
  const ports: OutputPortCell[] = [];
  const parts = cell.split(outputPortSeparator);
  for (const [i, part] of parts.entries()) {
    const label = parts.length > 1 ? `Port ${i + 1}: ` : '';
    const tokens = part.split(':').map((t) => t.trim());
    if (tokens.length < 3 || tokens.slice(0, 3).some((t) => t === '')) {
      return { ok: false, message: `${label}write connector:volts:max_a (e.g. usb-c:5:3), not "${part.trim()}"` };
    }
    const [connector = '', voltsText = '', ampsText = '', ...options] = tokens;
    const volts = readNumberCell(voltsText, delimiter);
    if (!volts.ok) return { ok: false, message: `${label}volts: ${volts.message}` };
    const maxA = readNumberCell(ampsText, delimiter);
    if (!maxA.ok) return { ok: false, message: `${label}max_a: ${maxA.message}` };
    const port: OutputPortCell = { connector, volts: volts.value, maxA: maxA.value, captiveCable: false };
    for (const option of options) {
      const lower = option.toLowerCase();
      if (lower === 'captive') {
        port.captiveCable = true;
      } else if (lower.startsWith('pd=')) {
        const pd: number[] = [];
        for (const v of option.slice(3).split('/')) {
          const n = readNumberCell(v, delimiter);
          if (!n.ok) return { ok: false, message: `${label}pd: ${n.message}` };
          pd.push(n.value);
        }
        port.usbPdVolts = pd;
      } else {
        return { ok: false, message: `${label}unknown part "${option}" (use pd=9/12 or captive)` };
      }
    }
    ports.push(port);
  }
  return { ok: true, value: ports };
}

/**
 * Writes output ports in the compact form {@link readOutputPortsCell} reads.
 *
 * @example
 * writeOutputPortsCell([{ connector: 'usb-c', volts: 5, maxA: 3, usbPdVolts: [9], captiveCable: true }]);
 * // → 'usb-c:5:3:pd=9:captive'
 */
export function writeOutputPortsCell(ports: readonly OutputPort[]): string {
  return ports
    .map((p) => {
      const parts = [p.connector, String(p.volts), String(p.maxA)];
      if (p.usbPdVolts.length > 0) parts.push(`pd=${p.usbPdVolts.map(String).join('/')}`);
      if (p.captiveCable) parts.push('captive');
      return parts.join(':');
    })
    .join(outputPortSeparator);
}

/**
 * Characters that make a spreadsheet treat a cell as a formula (OWASP "CSV Injection"), plus the guard's own
 * apostrophe so that guarding is reversible.
 */
const guardedFirstCharacter = /^['=+\-@\t\r]/;

/**
 * Guards text for export: a value a spreadsheet would run as a formula gets a leading `'`.
 * {@link unguardText} undoes it on import.
 *
 * @example
 * guardText('=1+2'); // → "'=1+2"
 */
export function guardText(text: string): string {
  return guardedFirstCharacter.test(text) ? `'${text}` : text;
}

/**
 * Removes the export guard: a leading `'` followed by a guarded character. A hand-written `'Tis` stays as it is.
 *
 * @example
 * unguardText("'=1+2"); // → '=1+2'
 */
export function unguardText(text: string): string {
  return text.startsWith("'") && guardedFirstCharacter.test(text.slice(1)) ? text.slice(1) : text;
}
