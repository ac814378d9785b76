import { describe, expect, it } from 'vitest';
import {
  guardText,
  readBooleanCell,
  readNumberCell,
  readOutputPortsCell,
  unguardText,
  writeOutputPortsCell,
} from './cells.js';

describe('readNumberCell', () => {
  it('reads plain decimals, signs and exponents', () => {
    expect(readNumberCell('10', ',')).toEqual({ ok: true, value: 10 });
    expect(readNumberCell(' -0.4 ', ',')).toEqual({ ok: true, value: -0.4 });
    expect(readNumberCell('.5', ',')).toEqual({ ok: true, value: 0.5 });
    expect(readNumberCell('1e-3', ',')).toEqual({ ok: true, value: 0.001 });
  });

  it('takes a decimal comma only in a semicolon-separated file', () => {
    expect(readNumberCell('2,4', ';')).toEqual({ ok: true, value: 2.4 });
    const comma = readNumberCell('2,4', ',');
    expect(comma.ok).toBe(false);
  });

  it('refuses thousands separators, units, words and blanks', () => {
    for (const text of ['1.000,5', '1,000,000', '10 W', '10W', 'ten', '', '1..2', '0x10', 'Infinity', 'NaN']) {
      expect(readNumberCell(text, ';').ok, text).toBe(false);
    }
  });

  it('refuses a number too large for a double', () => {
    expect(readNumberCell('1e400', ',').ok).toBe(false);
  });

  it('reads back every double it writes: String() is the shortest round-trip form (ECMAScript Number::toString)', () => {
    for (const value of [0.1 + 0.2, 1 / 3, 13.8, 5e-7, 123456789.123]) {
      const read = readNumberCell(String(value), ',');
      expect(read.ok && read.value).toBe(value);
    }
  });
});

describe('readBooleanCell', () => {
  it('reads true/false, yes/no, 1/0 in any case', () => {
    for (const t of ['true', 'TRUE', 'Yes', 'y', '1']) expect(readBooleanCell(t)).toEqual({ ok: true, value: true });
    for (const f of ['false', 'No', 'n', '0']) expect(readBooleanCell(f)).toEqual({ ok: true, value: false });
    expect(readBooleanCell('maybe').ok).toBe(false);
  });
});

describe('output ports cell', () => {
  it('reads several ports with PD voltages and a captive cable', () => {
    expect(readOutputPortsCell('usb-a:5:2.4|usb-c:5:3:pd=9/12:captive', ',')).toEqual({
      ok: true,
      value: [
        { connector: 'usb-a', volts: 5, maxA: 2.4, captiveCable: false },
        { connector: 'usb-c', volts: 5, maxA: 3, usbPdVolts: [9, 12], captiveCable: true },
      ],
    });
  });

  it('reads decimal commas in a semicolon file', () => {
    const read = readOutputPortsCell('usb-a:5:2,4', ';');
    expect(read.ok && read.value[0]?.maxA).toBeCloseTo(2.4, 10);
  });

  it('names the port and the part that is wrong', () => {
    const short = readOutputPortsCell('usb-a:5:2.4|usb-c:5', ',');
    expect(short).toEqual({ ok: false, message: expect.stringContaining('Port 2: write connector:volts:max_a') });
    const badAmps = readOutputPortsCell('usb-a:5:lots', ',');
    expect(badAmps).toEqual({ ok: false, message: 'max_a: Not a number: "lots"' });
    const badOption = readOutputPortsCell('usb-c:5:3:fast', ',');
    expect(badOption).toEqual({ ok: false, message: expect.stringContaining('unknown part "fast"') });
  });

  it('writes what it reads', () => {
    const ports = [
      { connector: 'usb-a' as const, volts: 5, maxA: 2.4, usbPdVolts: [], captiveCable: false },
      { connector: 'usb-c' as const, volts: 5, maxA: 3, usbPdVolts: [9, 12, 15], captiveCable: true },
    ];
    const text = writeOutputPortsCell(ports);
    expect(text).toBe('usb-a:5:2.4|usb-c:5:3:pd=9/12/15:captive');
    const read = readOutputPortsCell(text, ',');
    expect(read.ok && read.value).toEqual([
      { connector: 'usb-a', volts: 5, maxA: 2.4, captiveCable: false },
      { connector: 'usb-c', volts: 5, maxA: 3, usbPdVolts: [9, 12, 15], captiveCable: true },
    ]);
  });
});

describe('formula guard (OWASP "CSV Injection": cells starting with = + - @ tab or CR)', () => {
  it('guards the formula starters and undoes it', () => {
    for (const text of ['=SUM(A1)', '+1', '-5 °C bag', '@cmd', '\tx', "'=x", "''"]) {
      expect(guardText(text).startsWith("'"), text).toBe(true);
      expect(unguardText(guardText(text))).toBe(text);
    }
  });

  it('leaves ordinary text and a hand-written apostrophe alone', () => {
    expect(guardText('Ridgeline 10 W')).toBe('Ridgeline 10 W');
    expect(unguardText("'Tis the bank")).toBe("'Tis the bank");
  });
});
