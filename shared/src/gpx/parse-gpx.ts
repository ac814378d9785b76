import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { maxGpxBytes } from './gpx-constants.js';
import type { GeoPoint } from './great-circle.js';

/** A point of a GPX track or route: its place and, when the file records it, its time (ms since 1970, UTC). */
export interface GpxPoint extends GeoPoint {
  timeMs: number | null;
}

/** Why a GPX file cannot be used. */
export type GpxErrorCode = 'too-large' | 'not-xml' | 'not-gpx' | 'no-points' | 'out-of-range';

/** A problem with a GPX file, in words for the person who chose it. */
export interface GpxError {
  code: GpxErrorCode;
  message: string;
}

/** The points of a GPX file: its first track's points (all segments in order), else its first route's. */
export interface GpxTrack {
  /** The track's or route's `<name>`, or the file's metadata name, or null. */
  name: string | null;
  source: 'track' | 'route';
  points: GpxPoint[];
}

export type GpxParseResult = { ok: true; track: GpxTrack } | { ok: false; error: GpxError };

const mib = (bytes: number): string => `${Math.round((bytes / (1024 * 1024)) * 10) / 10} MB`;

/**
 * The size check, before any parsing: null when a file of `sizeBytes` may be read.
 * @example gpxSizeError(20 * 1024 * 1024)?.code // 'too-large'
 */
export function gpxSizeError(sizeBytes: number, limitBytes: number = maxGpxBytes): GpxError | null {
  if (sizeBytes <= limitBytes) return null;
  return {
    code: 'too-large',
    message: `This file is ${mib(sizeBytes)}; GPX files up to ${mib(limitBytes)} can be read. Thin the track (fewer points) in your mapping software and try again.`,
  };
}

const listTags = new Set(['trk', 'trkseg', 'trkpt', 'rte', 'rtept']);

const parser = new XMLParser({
  ignoreAttributes: false,
  attributeNamePrefix: '',
  removeNSPrefix: true,
  parseAttributeValue: false,
  parseTagValue: false,
  processEntities: false,
  isArray: (name) => listTags.has(name),
});

type XmlNode = Record<string, unknown>;

const isNode = (value: unknown): value is XmlNode => typeof value === 'object' && value !== null;
const nodes = (value: unknown): XmlNode[] => (Array.isArray(value) ? value.filter(isNode) : []);
const textOf = (value: unknown): string | null => {
  if (typeof value === 'string') return value.trim() || null;
  if (isNode(value) && typeof value['#text'] === 'string') return value['#text'].trim() || null;
  return null;
};

/** A coordinate as written in the file: a decimal number, nothing else. */
const coordinate = (value: unknown): number => {
  const text = typeof value === 'string' ? value.trim() : '';
  return /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(text) ? Number(text) : Number.NaN;
};

const toPoints = (raw: XmlNode[]): GpxPoint[] | GpxError => {
  const points: GpxPoint[] = [];
  for (const [index, node] of raw.entries()) {
    const latDeg = coordinate(node.lat);
    const lonDeg = coordinate(node.lon);
    if (!(latDeg >= -90 && latDeg <= 90) || !(lonDeg >= -180 && lonDeg <= 180)) {
      return {
        code: 'out-of-range',
        message: `Point ${index + 1} has latitude ${String(node.lat ?? '(none)')} and longitude ${String(node.lon ?? '(none)')}: latitude must be between −90° and 90°, longitude between −180° and 180°.`,
      };
    }
    const time = textOf(node.time);
    const timeMs = time === null ? Number.NaN : Date.parse(time);
    points.push({ latDeg, lonDeg, timeMs: Number.isFinite(timeMs) ? timeMs : null });
  }
  return points;
};

/**
 * Reads a GPX 1.0 or 1.1 file (GPX 1.1 schema, topografix.com) into the points of its first track — every
 * `<trkseg>` in order — or, with no track points, of its first route (`<rtept>`). Waypoints alone are not a
 * route. Checks the size first, then that the text is well-formed XML with a `<gpx>` root, that it has
 * points, and that every coordinate is a number in range.
 * @example parseGpx('<gpx><trk><trkseg><trkpt lat="1" lon="2"/></trkseg></trk></gpx>')
 * // → { ok: true, track: { name: null, source: 'track', points: [{ latDeg: 1, lonDeg: 2, timeMs: null }] } }
 */
export function parseGpx(text: string, limitBytes: number = maxGpxBytes): GpxParseResult {
  // A string of n UTF-16 units is at least n bytes: a cheap lower bound checked before any parsing.
  const sizeError = gpxSizeError(text.length, limitBytes);
  if (sizeError) return { ok: false, error: sizeError };
  const body = text.replace(/^\uFEFF/, '');
  const notXml: GpxError = {
    code: 'not-xml',
    message: 'This file is not a GPX file: it is not readable XML. Export the route or track as GPX and try again.',
  };
  if (body.trim() === '' || XMLValidator.validate(body) !== true) return { ok: false, error: notXml };
  let document: unknown;
  try {
    document = parser.parse(body);
  } catch {
    return { ok: false, error: notXml };
  }
  const gpx = isNode(document) ? document.gpx : undefined;
  if (!isNode(gpx)) {
    return {
      ok: false,
      error: { code: 'not-gpx', message: 'This XML file is not GPX: it has no <gpx> element.' },
    };
  }
  const metadataName = isNode(gpx.metadata) ? textOf(gpx.metadata.name) : null;
  const tracks = nodes(gpx.trk);
  const trackPoints = (tracks[0] ? nodes(tracks[0].trkseg) : []).flatMap((segment) => nodes(segment.trkpt));
  const routes = nodes(gpx.rte);
  const routePoints = routes[0] ? nodes(routes[0].rtept) : [];
  const source = trackPoints.length > 0 ? 'track' : 'route';
  const raw = source === 'track' ? trackPoints : routePoints;
  if (raw.length === 0) {
    return {
      ok: false,
      error: {
        code: 'no-points',
        message: 'This GPX file has no track or route points. Waypoints alone are not a route: export the track.',
      },
    };
  }
  const points = toPoints(raw);
  if (!Array.isArray(points)) return { ok: false, error: points };
  const owner = source === 'track' ? tracks[0] : routes[0];
  return { ok: true, track: { name: textOf(owner?.name) ?? metadataName, source, points } };
}
