import { describe, expect, it } from 'vitest';
import { cellTemperatureC } from './cell-temperature.js';

describe('cellTemperatureC', () => {
  it("matches pvlib-python's Ross/NOCT test values", () => {
    // pvlib-python pvlib/tests/test_temperature.py `test_ross`: G [1000, 600, 1000], Ta [20, 40, 60],
    // NOCT [40, 100, 20] → [45, 100, 60].
    expect(cellTemperatureC(20, 1000, { noctC: 40 })).toBeCloseTo(45, 9);
    expect(cellTemperatureC(40, 600, { noctC: 100 })).toBeCloseTo(100, 9);
    expect(cellTemperatureC(60, 1000, { noctC: 20 })).toBeCloseTo(60, 9);
  });

  it("matches pvlib-python's Faiman test values", () => {
    // pvlib-python `test_faiman_ndarray`: G [0, 500, 0], Ta [0, 10, 5], wind [10, 5, 0] → [0, 18.446, 5].
    expect(cellTemperatureC(0, 0, { model: 'faiman', windSpeedMs: 10 })).toBeCloseTo(0, 9);
    expect(cellTemperatureC(10, 500, { model: 'faiman', windSpeedMs: 5 })).toBeCloseTo(18.446, 3);
    expect(cellTemperatureC(5, 0, { model: 'faiman', windSpeedMs: 0 })).toBeCloseTo(5, 9);
  });

  it('reaches NOCT at the NOCT conditions with the default 45 °C', () => {
    expect(cellTemperatureC(20, 800)).toBeCloseTo(45, 9);
    expect(cellTemperatureC(-5, 0)).toBeCloseTo(-5, 9);
    expect(cellTemperatureC(-5, -50)).toBeCloseTo(-5, 9);
  });
});
