// Reading the stored details of an audit event defensively: old rows, or rows from a newer release, may lack a field.

export type Details = Record<string, unknown>;

export function parseDetails(detailsJson: string): Details {
  try {
    const value: unknown = JSON.parse(detailsJson);
    return value && typeof value === 'object' && !Array.isArray(value) ? (value as Details) : {};
  } catch {
    return {};
  }
}

export function text(details: Details, key: string): string | null {
  const value = details[key];
  return typeof value === 'string' && value.trim() !== '' ? value : null;
}

export function count(details: Details, key: string): number | null {
  const value = details[key];
  if (typeof value === 'number' && Number.isFinite(value)) return value;
  return Array.isArray(value) ? value.length : null;
}

export function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}

/** The resolved names an event's words need: people and schemes by id, from the users and schemes tables. */
export interface AuditNames {
  person: (id: string | null | undefined) => string;
  scheme: (id: string | null | undefined) => string | null;
}

export interface DescribableEvent {
  action: string;
  actorId: string | null;
  entityType: string;
  entityId: string | null;
  schemeId: string | null;
  detailsJson: string;
}

export type Words = (event: DescribableEvent, details: Details, names: AuditNames) => string;
