/** A path under one trip: `tripPath('t1', 'plans', 'p2')` → `/trips/t1/plans/p2`, each part encoded. */
export const tripPath = (tripId: string, ...parts: string[]): string =>
  ['/trips', tripId, ...parts].map((part, i) => (i === 0 ? part : encodeURIComponent(part))).join('/');
