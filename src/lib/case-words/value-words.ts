import { CASE_FORMAT } from '@/lib/validation/case-schema';

// The case file's coded choices as a practitioner says them.
const CHOICES: Record<string, string> = {
  [CASE_FORMAT]: 'Sillmark case file',
  sillHeight: 'sill height',
  crestLength: 'crest length',
  'direct-step': 'direct step',
  'standard-step': 'standard step',
  'average-conveyance': 'average conveyance',
  'sharp-crested': 'sharp-crested weir',
  'broad-crested': 'broad-crested weir',
  ogee: 'ogee spillway',
  'rating-table': 'rating table',
  'square-edged': 'square-edged',
  'round-nosed': 'round-nosed',
  depth: 'fixed depth',
  weir: 'weir',
  SI: 'SI (m, m³/s)',
  US: 'US customary (ft, ft³/s)',
};

/** A stored input value as the pages show it: choices in words, true/false as yes/no, numbers as they are. */
export function valueInWords(value: string | number | boolean | null): string {
  if (value === null) return '—';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'number') return String(value);
  return CHOICES[value] ?? value;
}
