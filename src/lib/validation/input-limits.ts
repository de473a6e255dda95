// The largest inputs the portal accepts: one place, documented in the README under "Limits". Each keeps a case within
// what the engine evaluates in seconds on one core, and a request within what the server reads without strain.

/** Flood events in one case (a design check rarely needs more than a dozen return periods). */
export const MAX_EVENTS = 50;
/** Flood-level limits (places checked against a level) in one case. */
export const MAX_LIMITS = 200;
/** Surveyed cross-sections in one reach. */
export const MAX_SURVEYED_SECTIONS = 500;
/** [station, elevation] points in one surveyed cross-section. */
export const MAX_POINTS_PER_SECTION = 500;
/** Rows of a weir's rating table. */
export const MAX_RATING_TABLE_ROWS = 200;
/** Parcels in one scheme's register. */
export const MAX_PARCELS = 2000;
/** A JSON request body, in bytes (1 MiB). */
export const MAX_JSON_BYTES = 1024 * 1024;
/** Points of one event's inflow hydrograph. */
export const MAX_HYDROGRAPH_POINTS = 2000;
/** Rows of a reservoir's level–area or level–volume table. */
export const MAX_STORAGE_ROWS = 200;
/** Time steps one routing may take after refinement (each a solution of the storage-indication equation). */
export const ROUTING_STEP_LIMIT = 20_000;
/** Rows of the routing table kept in a result (the march may take more steps; the table keeps every k-th and the peaks). */
export const ROUTING_TABLE_ROWS = 1000;
/** Parcel outlines in one plan file (one per parcel of the register, at most). */
export const MAX_PLAN_OUTLINES = MAX_PARCELS;
/** Vertices in one parcel's outline, all its rings and parts together. */
export const MAX_OUTLINE_VERTICES = 1000;
/** Vertices of all the outlines of one plan together. */
export const MAX_PLAN_VERTICES = 200_000;
/** Vertices of the river centreline. */
export const MAX_CENTRELINE_VERTICES = 5000;
/** A plan file (GeoJSON or CSV of vertices), in bytes (4 MiB). */
export const MAX_PLAN_FILE_BYTES = 4 * 1024 * 1024;
