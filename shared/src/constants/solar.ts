/**
 * Constants of the sun, sky and temperature models. Each carries its unit in its name and its source.
 * Values marked `common practice` are trade habits with no single published source; `from memory` are
 * values recalled from the cited work rather than copied from it.
 */

/**
 * Total solar irradiance at 1 AU, W/m². Kopp & Lean (2011), "A new, lower value of total solar
 * irradiance: Evidence and climate significance", Geophysical Research Letters 38, L01706: 1360.8 ± 0.5.
 */
export const solarConstantWm2 = 1361;

/** Standard sea-level air pressure, Pa (ISO 2533:1975 standard atmosphere). */
export const standardPressurePa = 101_325;

/**
 * Sun altitude at sunrise and sunset, degrees: the upper limb touching a sea-level horizon with standard
 * refraction (34′) and the solar semi-diameter (16′). Meeus, Astronomical Algorithms, 2nd ed., ch. 15.
 */
export const sunriseAltitudeDeg = -0.833;

/**
 * Kasten & Young (1989) relative air mass coefficients: m = 1 / (cos z + a (96.07995 − z)^−b).
 * Kasten, F. & Young, A. T., "Revised optical air mass tables and approximation formula",
 * Applied Optics 28(22), 4735–4738.
 */
export const kastenYoungA = 0.50572;
export const kastenYoungOffsetDeg = 96.07995;
export const kastenYoungExponent = 1.6364;

/**
 * Linke turbidity used when none is given (dimensionless). TL ≈ 3 describes a clean, dry rural or
 * mountain atmosphere at mid-latitudes; pvlib's Ineichen tests use 3 as well. `common practice`.
 */
export const defaultLinkeTurbidity = 3;

/**
 * Ground reflectance (albedo) used when none is given: grass, soil, forest floor. Duffie & Beckman,
 * Solar Engineering of Thermal Processes, 3rd ed., §2.16 use 0.2 as the usual snow-free value
 * (`from memory`); fresh snow is about 0.7.
 */
export const defaultGroundAlbedo = 0.2;

/**
 * Tilt of a panel strapped to the outside of a pack while walking, degrees from horizontal. A pack's back
 * face leans a little off vertical when the wearer leans forward: 75° is our assumption
 * (`common practice`: panels hang near vertical on a pack).
 */
export const packPanelTiltDeg = 75;

/**
 * Number of evenly spaced headings averaged when the walking bearing is unknown (N, NE, E, … NW).
 * An engineering choice: 8 headings resolve the azimuth dependence of a 75° plane well (a check in
 * the tests compares 8 against 72 headings).
 */
export const unknownBearingHeadingCount = 8;

/**
 * Local clock hour of the day's highest air temperature, hours. Mid-afternoon, about 14:00–15:00 local,
 * is the usual daily maximum over land (`common practice`; e.g. Oke, Boundary Layer Climates, 2nd ed.,
 * ch. 2, `from memory`).
 */
export const dailyHighLocalHour = 15;

/** Local clock hour used as the time of the daily low when the sun does not rise or set (polar day or night). */
export const polarDailyLowLocalHour = 6;

/**
 * Nominal operating cell temperature, °C: cell temperature at 800 W/m², 20 °C air, 1 m/s wind, open rack.
 * Crystalline-silicon module data sheets give 42–48 °C; 45 °C is the usual default (`common practice`).
 */
export const defaultNoctC = 45;

/** Irradiance and air temperature at which NOCT is defined, W/m² and °C (IEC 61215 NOCT conditions). */
export const noctIrradianceWm2 = 800;
export const noctAirTempC = 20;

/**
 * Faiman (2008) heat-loss coefficients for crystalline-silicon modules: U0 in W/(m²·K), U1 in
 * W·s/(m³·K). Faiman, D., "Assessing the outdoor operating temperature of photovoltaic modules",
 * Progress in Photovoltaics 16(4), 307–315; the values are pvlib's defaults.
 */
export const faimanU0WPerM2K = 25;
export const faimanU1WsPerM3K = 6.84;

/** Wind speed assumed for the Faiman model when none is given, m/s (a light breeze; `common practice`). */
export const defaultWindSpeedMs = 1;
