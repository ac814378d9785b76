/**
 * Constants of the GPX reader, each with its unit and where it comes from.
 */

/**
 * Largest GPX file read, bytes (10 MiB). Our own limit: a multi-day track logged every few seconds stays
 * well below it, and a browser parses it in well under a second; a larger file is refused before parsing.
 */
export const maxGpxBytes = 10 * 1024 * 1024;

/**
 * Mean radius of the Earth, metres: the IUGG mean radius R1 = (2a + b) / 3 of the GRS 80 ellipsoid
 * (H. Moritz, "Geodetic Reference System 1980", Bulletin Géodésique 54, 1980; R1 = 6 371 008.8 m).
 */
export const meanEarthRadiusM = 6_371_008.8;

/**
 * A pause between two timestamped track points at least this long, hours, is read as a night between
 * walking days. `common practice`: walkers stop for the night for far longer, and lunch or summit stops
 * are far shorter.
 */
export const nightGapH = 6;
