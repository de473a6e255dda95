import { InvalidRequestError } from '@/lib/http/app-errors';
import { type PlanIssue, formatPlanIssue } from './plan-issues';

/** A refused plan file: every problem at its feature or line, for the upload form to list. */
export function planRefusal(issues: PlanIssue[]): InvalidRequestError {
  const count = issues.length;
  return new InvalidRequestError(
    issues.map((i) => ({ path: `${i.place}${i.field ? `, ${i.field}` : ''}`, message: formatPlanIssue(i) })),
    `The plan file has ${count} problem${count === 1 ? '' : 's'}; nothing was stored.`,
  );
}
