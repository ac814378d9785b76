import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { maxGpxBytes } from './gpx-constants.js';
import { gpxSizeError, parseGpx } from './parse-gpx.js';

const fixture = readFileSync(new URL('./fixtures/three-day-track.gpx', import.meta.url), 'utf8');
const gpx = (inner: string) =>
  `<?xml version="1.0"?><gpx version="1.1" xmlns="http://www.topografix.com/GPX/1/1">${inner}</gpx>`;

describe('parseGpx: normal files', () => {
  it('reads every segment of the first track in order, with times', () => {
    const result = parseGpx(fixture);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.track.source).toBe('track');
    expect(result.track.name).toBe('Cirrus Basin test loop');
    expect(result.track.points).toHaveLength(15);
    expect(result.track.points[0]?.latDeg).toBeCloseTo(46.5, 9);
    expect(result.track.points[0]?.lonDeg).toBeCloseTo(9.8, 9);
    expect(result.track.points[0]?.timeMs).toBe(Date.UTC(2026, 6, 1, 7));
    expect(result.track.points[14]?.latDeg).toBeCloseTo(46.51, 9);
  });

  it('falls back to a route when there is no track, and keeps points without times', () => {
    const result = parseGpx(
      gpx('<rte><name>Plan</name><rtept lat="-12.5" lon="-70.25"/><rtept lat="-12.6" lon="-70.2"/></rte>'),
    );
    expect(result.ok && result.track.source).toBe('route');
    expect(result.ok && result.track.points.map((p) => [p.latDeg, p.lonDeg, p.timeMs])).toEqual([
      [-12.5, -70.25, null],
      [-12.6, -70.2, null],
    ]);
  });

  it('reads GPX 1.0 without a namespace, a byte-order mark and prefixed tags', () => {
    expect(parseGpx('\uFEFF<gpx version="1.0"><trk><trkseg><trkpt lat="1" lon="2"/></trkseg></trk></gpx>').ok).toBe(
      true,
    );
    const prefixed =
      '<g:gpx xmlns:g="http://www.topografix.com/GPX/1/1"><g:trk><g:trkseg><g:trkpt lat="1" lon="2"/></g:trkseg></g:trk></g:gpx>';
    expect(parseGpx(prefixed).ok).toBe(true);
  });
});

describe('parseGpx: files it refuses', () => {
  const code = (text: string) => {
    const result = parseGpx(text);
    return result.ok ? 'ok' : result.error.code;
  };

  it('not XML: plain text, JSON, an empty file, an unclosed tag', () => {
    expect(code('hello, this is a shopping list')).toBe('not-xml');
    expect(code('{"type":"FeatureCollection"}')).toBe('not-xml');
    expect(code('')).toBe('not-xml');
    expect(code('<gpx><trk><trkseg><trkpt lat="1" lon="2"></trkseg></trk></gpx>')).toBe('not-xml');
  });

  it('XML that is not GPX', () => {
    expect(code('<kml><Placemark/></kml>')).toBe('not-gpx');
  });

  it('no points: an empty track, waypoints only', () => {
    expect(code(gpx('<trk><trkseg></trkseg></trk>'))).toBe('no-points');
    expect(code(gpx('<wpt lat="1" lon="2"><name>Hut</name></wpt>'))).toBe('no-points');
  });

  it('coordinates out of range or not numbers, naming the point', () => {
    const bad = parseGpx(gpx('<trk><trkseg><trkpt lat="1" lon="2"/><trkpt lat="91" lon="2"/></trkseg></trk>'));
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.error.code).toBe('out-of-range');
      expect(bad.error.message).toMatch(/Point 2 has latitude 91/);
    }
    expect(code(gpx('<trk><trkseg><trkpt lat="1" lon="180.5"/></trkseg></trk>'))).toBe('out-of-range');
    expect(code(gpx('<trk><trkseg><trkpt lat="north" lon="2"/></trkseg></trk>'))).toBe('out-of-range');
    expect(code(gpx('<trk><trkseg><trkpt lon="2"/></trkseg></trk>'))).toBe('out-of-range');
  });

  it('a 20 MB file is refused by size before parsing', () => {
    expect(gpxSizeError(20 * 1024 * 1024)?.code).toBe('too-large');
    expect(gpxSizeError(20 * 1024 * 1024)?.message).toMatch(/20 MB.*10 MB/);
    expect(gpxSizeError(maxGpxBytes)).toBeNull();
    // 20 MB of text that would not even parse: the size answer comes first.
    expect(code('x'.repeat(20 * 1024 * 1024))).toBe('too-large');
  });
});
