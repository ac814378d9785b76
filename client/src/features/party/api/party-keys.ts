/**
 * Query keys of the party's data. They sit under the trip's own key (`['trips', tripId]`, the trips
 * feature's), so invalidating the trip refreshes its members too, and a change to the party can refresh
 * the trip page (which shows the members) without importing another feature.
 */
export const partyKeys = {
  trip: (tripId: string) => ['trips', tripId] as const,
  members: (tripId: string) => ['trips', tripId, 'members'] as const,
  invites: (tripId: string) => ['trips', tripId, 'invites'] as const,
  shareLink: (tripId: string) => ['trips', tripId, 'share'] as const,
  pool: (tripId: string) => ['trips', tripId, 'pool'] as const,
  /** The trip list (its member counts change when someone joins or leaves). */
  tripList: () => ['trips'] as const,
};

/** `/trips/:id` with the id encoded, the start of every party route. */
export const tripPath = (tripId: string) => `/trips/${encodeURIComponent(tripId)}`;
