// Status in words and an icon as well as colour, never colour alone.
const STYLES: Record<string, { icon: string; className: string }> = {
  draft: { icon: '✎', className: 'text-ink-soft border-paper-edge' },
  returned: { icon: '↩', className: 'text-verdict-caution border-verdict-caution' },
  submitted: { icon: '⧗', className: 'text-accent border-accent' },
  countersigned: { icon: '✔', className: 'text-verdict-pass border-verdict-pass' },
  issued: { icon: '✔', className: 'text-verdict-pass border-verdict-pass' },
  superseded: { icon: '⇢', className: 'text-ink-soft border-paper-edge' },
  revoked: { icon: '✖', className: 'text-verdict-fail border-verdict-fail' },
  active: { icon: '●', className: 'text-verdict-pass border-verdict-pass' },
  invited: { icon: '✉', className: 'text-accent border-accent' },
  disabled: { icon: '○', className: 'text-ink-faint border-paper-edge' },
  deactivated: { icon: '○', className: 'text-ink-faint border-paper-edge' },
  overdue: { icon: '!', className: 'text-verdict-fail border-verdict-fail' },
  'due soon': { icon: '⧗', className: 'text-verdict-caution border-verdict-caution' },
};

export function StatusLabel({ status }: { status: string }) {
  const style = STYLES[status] ?? { icon: '•', className: 'text-ink-soft border-paper-edge' };
  return (
    <span className={`inline-flex items-center gap-1 rounded border px-2 py-0.5 text-xs ${style.className}`}>
      <span aria-hidden="true">{style.icon}</span>
      {status}
    </span>
  );
}
