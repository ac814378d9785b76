import { describe, expect, it } from 'vitest';
import { clearSkyIrradiance } from './clear-sky.js';
import {
  clearPlaneWm2,
  flatPlane,
  packPlane,
  packPlaneAllHeadingsWm2,
  proppedPlane,
  type SkyAtStep,
} from './carry-modes.js';

function skyAt(altitudeDeg: number, azimuthDeg: number): SkyAtStep {
  return {
    sunAltitudeDeg: altitudeDeg,
    sunAzimuthDeg: azimuthDeg,
    clear: clearSkyIrradiance(altitudeDeg, 172),
    albedo: 0.2,
  };
}

describe('pack plane', () => {
  it('faces behind the direction of travel at a steep tilt', () => {
    expect(packPlane(0)).toEqual({ tiltDeg: 75, azimuthDeg: 180 });
    expect(packPlane(270)).toEqual({ tiltDeg: 75, azimuthDeg: 90 });
    expect(packPlane(-90).azimuthDeg).toBeCloseTo(90, 9);
  });

  it('harvests more walking away from the sun than towards it', () => {
    const sky = skyAt(40, 180);
    expect(clearPlaneWm2(packPlane(0), sky)).toBeGreaterThan(clearPlaneWm2(packPlane(180), sky) + 300);
  });

  it('averages 8 headings to within 2 % of a 72-heading average', () => {
    for (const altitude of [5, 20, 45, 70]) {
      const sky = skyAt(altitude, 150);
      const eight = packPlaneAllHeadingsWm2(sky, 8);
      const fine = packPlaneAllHeadingsWm2(sky, 72);
      expect(Math.abs(eight - fine) / fine).toBeLessThan(0.02);
      let best = 0;
      let worst = Number.POSITIVE_INFINITY;
      for (let b = 0; b < 360; b += 45) {
        const value = clearPlaneWm2(packPlane(b), sky);
        best = Math.max(best, value);
        worst = Math.min(worst, value);
      }
      expect(eight).toBeLessThanOrEqual(best + 1e-9);
      expect(eight).toBeGreaterThanOrEqual(worst - 1e-9);
    }
  });
});

describe('propped plane', () => {
  it('aimed at the sun catches the whole beam plus the sky it sees', () => {
    const sky = skyAt(30, 200);
    const plane = proppedPlane(30, 200);
    expect(plane).toEqual({ tiltDeg: 60, azimuthDeg: 200 });
    const total = clearPlaneWm2(plane, sky);
    expect(total).toBeGreaterThan(sky.clear.dniWm2);
    // No orientation does better than facing the sun by more than the diffuse it trades.
    expect(total).toBeGreaterThan(clearPlaneWm2(flatPlane, sky));
  });

  it('clamps to vertical for a sun at or below the horizon', () => {
    expect(proppedPlane(-3, 90).tiltDeg).toBe(90);
    expect(proppedPlane(95, 90).tiltDeg).toBe(0);
  });
});
