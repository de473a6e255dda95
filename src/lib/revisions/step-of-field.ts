import type { EditableStep } from '@/lib/validation/scheme-schemas';

/** The wizard step where a case-file field is entered, so an incomplete or unsolvable case can send the designer there. */
export function stepOfField(path: string): EditableStep {
  if (path === 'case' || path === 'units' || path === 'title' || path.startsWith('format') || path.startsWith('version')) return 'scheme';
  if (path === 'reach.bedLevelAtControl' || path === 'reach.length') return 'scheme';
  if (path === 'reach.bankHeight' || /^reach\.sections\[\d+\]\.bankLevel/.test(path)) return 'limits';
  if (path.startsWith('reach') || path.startsWith('profile')) return 'channel';
  if (path.startsWith('events')) return 'flows';
  if (path.startsWith('control') || path.startsWith('existingControl')) return 'structure';
  return 'limits';
}

export interface StepIssue {
  path: string;
  message: string;
  step: EditableStep;
}

export function withSteps(issues: readonly { path: string; message: string }[]): StepIssue[] {
  return issues.map((issue) => ({ ...issue, step: stepOfField(issue.path) }));
}
