import { type FieldIssue, UnprocessableError } from '@/lib/http/app-errors';
import type { CaseInput } from '@/lib/validation/case-schema';

// What to reduce when a case is beyond the engine, from the parts of this case that make it large.
function reductions(input: CaseInput): FieldIssue[] {
  const issues: FieldIssue[] = [];
  if (input.events.length > 1) issues.push({ path: 'events', message: `reduce the number of flood events (this case has ${input.events.length})` });
  if (input.reach.kind === 'surveyed') {
    const points = Math.max(...input.reach.sections.map((s) => s.points.length));
    issues.push({ path: 'reach.sections', message: `reduce the number of surveyed cross-sections (this case has ${input.reach.sections.length})` });
    issues.push({ path: 'reach.sections.points', message: `reduce the points per cross-section (the largest has ${points})` });
  }
  if (input.sizing) issues.push({ path: 'sizing', message: 'leave out crest sizing, or narrow it with sizing.min, sizing.max and a larger sizing.increment' });
  if (input.sensitivity) issues.push({ path: 'sensitivity', message: 'leave out the sensitivity runs' });
  return issues;
}

export function caseTooSlow(input: CaseInput, limitMs: number): UnprocessableError {
  return new UnprocessableError(`This case takes too long to evaluate (more than ${Math.round(limitMs / 1000)} s): reduce its size and try again.`, reductions(input));
}

export function caseTooLarge(input: CaseInput): UnprocessableError {
  return new UnprocessableError('This case is too large for the engine to evaluate: reduce its size and try again.', reductions(input));
}
