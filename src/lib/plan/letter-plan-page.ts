import type { PlanDrawing } from './plan-drawing';

// Apart from letter-plan.ts, which reads the stored plan: the letter's renderer needs only these, and runs on a
// worker thread that must not load the database.

export interface LetterPlan {
  drawing: PlanDrawing;
  coordinateSystem: string;
  event: string;
}

/** Page size of the plan in a letter, in PDF points (the text width of an A4 page with 56 pt margins). */
export const LETTER_PLAN_SIZE = { width: 483, height: 250 } as const;
