// The placeholders a letter template may use, each with what it stands for. Shared by the template form (the list
// beside it and the check as one types) and the server (the check on saving, the filling in when letters are made).

export const PLACEHOLDERS = {
  owner_name: 'the owner’s name',
  postal_address: 'the owner’s postal address, on one line',
  parcel_reference: 'the parcel’s reference',
  scheme_name: 'the scheme’s name',
  watercourse: 'the river',
  site: 'the site of the structure',
  letter_date: 'the date of the letter',
  response_deadline: 'the date by which to respond',
  officer_name: 'the name of the officer who makes the letters',
  officer_role: 'that officer’s role',
  certificate_number: 'the number of the design certificate',
  verification_link: 'the web address where the certificate can be checked',
} as const;

export type PlaceholderName = keyof typeof PLACEHOLDERS;
export type PlaceholderValues = Record<PlaceholderName, string>;

export const PLACEHOLDER_NAMES = Object.keys(PLACEHOLDERS) as PlaceholderName[];

const isPlaceholder = (name: string): name is PlaceholderName => Object.hasOwn(PLACEHOLDERS, name);

/** Every `{…}` in the text that is not one of ours, as typed (with its braces), each once, in order of appearance. */
export function unknownPlaceholders(text: string): string[] {
  const unknown = new Set<string>();
  for (const match of text.matchAll(/\{([^{}\n]{0,40})\}/g)) if (!isPlaceholder(match[1])) unknown.add(match[0]);
  // A lone brace is almost always a placeholder typed wrongly ("{owner_name" or "owner_name}").
  for (const match of text.replace(/\{[^{}\n]{0,40}\}/g, '').matchAll(/[{}][^\s{}]{0,40}|[^\s{}]{0,40}[{}]/g)) unknown.add(match[0]);
  return [...unknown];
}

/** The message for a paragraph with unknown placeholders, naming them and the ones that exist. */
export function unknownPlaceholderMessage(unknown: string[]): string {
  const names = unknown.map((u) => `“${u}”`).join(', ');
  return `uses ${unknown.length === 1 ? 'a placeholder' : 'placeholders'} the letter does not know: ${names}. The placeholders are ${PLACEHOLDER_NAMES.map((n) => `{${n}}`).join(', ')}`;
}

/** Replaces each placeholder by its value; the template was checked on saving, so nothing else is in braces. */
export function fillPlaceholders(text: string, values: PlaceholderValues): string {
  return text.replace(/\{([a-z_]+)\}/g, (whole, name: string) => (isPlaceholder(name) ? values[name] : whole));
}
