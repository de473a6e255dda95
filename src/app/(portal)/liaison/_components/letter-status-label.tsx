import type { LetterStatus } from '@/lib/db/models/letter';

const STATUSES: Record<LetterStatus, { icon: string; label: string; className: string }> = {
  queued: { icon: '⧗', label: 'Queued', className: 'text-accent border-accent' },
  sending: { icon: '➤', label: 'Sending', className: 'text-accent border-accent' },
  sent: { icon: '✔', label: 'Sent', className: 'text-verdict-pass border-verdict-pass' },
  failed: { icon: '✖', label: 'Failed', className: 'text-verdict-fail border-verdict-fail' },
  acknowledged: { icon: '✉', label: 'Acknowledged', className: 'text-verdict-pass border-verdict-pass' },
  held: { icon: '⏸', label: 'Held, not sent', className: 'text-verdict-fail border-verdict-fail' },
  'to-post': { icon: '✎', label: 'To post', className: 'text-verdict-caution border-verdict-caution' },
  posted: { icon: '✔', label: 'Posted', className: 'text-verdict-pass border-verdict-pass' },
  withdrawn: { icon: '⊘', label: 'Withdrawn', className: 'text-ink-soft border-paper-edge' },
};

export function LetterStatusLabel({ status }: { status: LetterStatus }) {
  const s = STATUSES[status];
  return (
    <span className={`inline-flex items-center gap-1 whitespace-nowrap rounded border px-2 py-0.5 text-xs ${s.className}`}>
      <span aria-hidden="true">{s.icon}</span>
      {s.label}
    </span>
  );
}
