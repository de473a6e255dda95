import { describeCaseField } from '@/lib/case-words/describe-case-field';
import type { EditableStep } from '@/lib/validation/scheme-schemas';

/** The wizard step where a case-file field is entered, so an incomplete or unsolvable case can send the designer there. */
export function stepOfField(path: string): EditableStep {
  return describeCaseField(path).step;
}

export interface StepIssue {
  path: string;
  message: string;
  step: EditableStep;
}

export function withSteps(issues: readonly { path: string; message: string }[]): StepIssue[] {
  return issues.map((issue) => ({ ...issue, step: stepOfField(issue.path) }));
}
