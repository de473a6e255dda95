import { StatusIcon } from './status-icon';

// Status in words and an icon as well as colour, never colour alone.
const STYLES: Record<string, string> = {
  draft: 'text-ink-soft border-paper-edge',
  returned: 'text-verdict-caution border-verdict-caution',
  submitted: 'text-accent border-accent',
  countersigned: 'text-verdict-pass border-verdict-pass',
  issued: 'text-verdict-pass border-verdict-pass',
  superseded: 'text-ink-soft border-paper-edge',
  revoked: 'text-verdict-fail border-verdict-fail',
  active: 'text-verdict-pass border-verdict-pass',
  invited: 'text-accent border-accent',
  disabled: 'text-ink-faint border-paper-edge',
  deactivated: 'text-ink-faint border-paper-edge',
  overdue: 'text-verdict-fail border-verdict-fail',
  'due soon': 'text-verdict-caution border-verdict-caution',
};

export function StatusLabel({ status }: { status: string }) {
  return (
    <span className={`inline-flex items-center gap-1 rounded border px-2 py-0.5 text-xs ${STYLES[status] ?? 'text-ink-soft border-paper-edge'}`}>
      <StatusIcon name={status} className="mt-0" />
      {status}
    </span>
  );
}
