import 'server-only';
import { structureRatingOffThread } from '@/lib/engine-pool/engine-pool';
import { AppError } from '@/lib/http/app-errors';
import { EngineError } from '@/lib/hydraulics/errors';
import type { StructureRating } from '@/lib/hydraulics/structure-rating';
import type { CaseInput } from '@/lib/validation/case-schema';

export type SheetRating = { status: 'rated'; rating: StructureRating } | { status: 'none' } | { status: 'unrated'; reason: string };

/**
 * The structure's rating for the results sheet, from the engine pool. A given depth has none; a rating the engine
 * cannot work out (or a busy engine) leaves the rest of the sheet standing, with the reason in words.
 */
export async function ratingForSheet(input: CaseInput): Promise<SheetRating> {
  if (input.control.type !== 'weir') return { status: 'none' };
  try {
    return { status: 'rated', rating: await structureRatingOffThread(input) };
  } catch (error) {
    if (error instanceof EngineError || error instanceof AppError) return { status: 'unrated', reason: error.message };
    throw error;
  }
}
