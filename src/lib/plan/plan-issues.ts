// A problem in a plan file, at the feature (GeoJSON, counted from 1) or line (CSV, the header is line 1) it is in.

export interface PlanIssue {
  /** "feature 3", "line 12", or "the file" for the whole. */
  place: string;
  /** The field in words ("parcel reference", "ring 1, vertex 5, northing"), or null when the whole place is wrong. */
  field: string | null;
  message: string;
}

const NAMES: Record<string, string> = {
  type: 'type',
  properties: 'properties',
  parcel_reference: 'parcel reference',
  centreline: 'centreline mark',
  chainage_start_m: 'chainage of the first vertex',
  geometry: 'geometry',
  coordinates: 'coordinates',
  features: 'features',
};

/** A GeoJSON path in words: ['geometry', 'coordinates', 0, 4, 1] → "coordinates, ring 1, vertex 5, northing". */
export function geoJsonFieldWords(path: readonly PropertyKey[], geometryType: string | null): string {
  const words: string[] = [];
  const at = path.indexOf('coordinates');
  path.forEach((key, i) => {
    if (typeof key === 'string') {
      if (key === 'geometry' && path[i + 1] === 'type') return words.push('geometry type');
      if ((key === 'geometry' && path[i + 1] !== undefined) || (key === 'type' && path[i - 1] === 'geometry')) return;
      if (key === 'properties' && path[i + 1] !== undefined) return;
      words.push(NAMES[key] ?? key);
      return;
    }
    if (typeof key !== 'number' || at < 0) return words.push(`item ${String(key)}`);
    const depth = i - at - 1;
    const levels = geometryType === 'MultiPolygon' ? ['polygon', 'ring', 'vertex', 'axis'] : geometryType === 'LineString' ? ['vertex', 'axis'] : ['ring', 'vertex', 'axis'];
    const level = levels[depth];
    if (level === 'axis') words.push(key === 0 ? 'easting' : key === 1 ? 'northing' : 'height');
    else if (level) words.push(`${level} ${key + 1}`);
  });
  return words.join(', ') || 'feature';
}

export function formatPlanIssue(issue: PlanIssue): string {
  const place = issue.place.charAt(0).toUpperCase() + issue.place.slice(1);
  return `${place}${issue.field ? `, ${issue.field}` : ''}: ${issue.message}`;
}
