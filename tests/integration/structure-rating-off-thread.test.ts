import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { structureRatingOffThread } from '@/lib/engine-pool/engine-pool';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { structureRating } from '@/lib/hydraulics/structure-rating';
import type { CaseInput } from '@/lib/validation/case-schema';
import { parseCase } from '@/lib/validation/parse-case';

function demoCase(file: string): CaseInput {
  const parsed = parseCase(JSON.parse(readFileSync(join('db/seeds/cases', file), 'utf8')));
  if (!parsed.ok) throw new Error(file);
  return parsed.value;
}

describe('the structure rating runs on the engine pool', () => {
  it('gives on a worker thread the same rating as the engine on this thread', async () => {
    const input = demoCase('wendle-harrowfield-broad-crested.json');
    expect(await structureRatingOffThread(input)).toEqual(structureRating(input));
  });

  it('brings the engine’s own error class back across the thread boundary', async () => {
    const input = demoCase('wendle-harrowfield-depth-control.json');
    const refused = await structureRatingOffThread(input).catch((error: unknown) => error);
    expect(refused).toBeInstanceOf(InvalidInputError);
    expect((refused as InvalidInputError).field).toBe('control');
  });
});
