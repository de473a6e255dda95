import type { CaseInput } from '@/lib/validation/case-schema';

const CONTROL_METHOD: Record<string, string> = {
  'sharp-crested': 'the sharp-crested weir equation',
  'broad-crested': 'the broad-crested weir equation',
  ogee: 'the ogee spillway equation',
  'rating-table': "the structure's rating table",
};

/** The published methods behind a revision's numbers, named in words for the letter's caution. */
export function namedMethods(input: CaseInput): string[] {
  const method = input.profile.method ?? (input.reach.kind === 'prismatic' ? 'direct-step' : 'standard-step');
  return [
    "Manning's equation for the friction of the channel",
    method === 'direct-step' ? 'the direct step method for the water-surface profile' : 'the standard step method for the water-surface profile',
    input.control.type === 'weir' ? `${CONTROL_METHOD[input.control.kind]} for the level at the structure` : 'a fixed control depth at the structure',
  ];
}
