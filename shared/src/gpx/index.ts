/** Reading GPX routes and tracks for a trip: start point, walking days, bearings and distances. */
export * from './gpx-constants.js';
export * from './great-circle.js';
export * from './parse-gpx.js';
export * from './walking-days.js';
export * from './gpx-route.js';
