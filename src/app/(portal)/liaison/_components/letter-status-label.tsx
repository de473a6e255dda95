import type { LetterStatus } from '@/lib/db/models/letter';
import { StatusIcon } from '@/components/ui/status-icon';

const STATUSES: Record<LetterStatus, { label: string; className: string }> = {
  queued: { label: 'Queued', className: 'text-accent border-accent' },
  sending: { label: 'Sending', className: 'text-accent border-accent' },
  sent: { label: 'Sent', className: 'text-verdict-pass border-verdict-pass' },
  failed: { label: 'Failed', className: 'text-verdict-fail border-verdict-fail' },
  acknowledged: { label: 'Acknowledged', className: 'text-verdict-pass border-verdict-pass' },
  held: { label: 'Held, not sent', className: 'text-verdict-fail border-verdict-fail' },
  'to-post': { label: 'To post', className: 'text-verdict-caution border-verdict-caution' },
  posted: { label: 'Posted', className: 'text-verdict-pass border-verdict-pass' },
  withdrawn: { label: 'Withdrawn', className: 'text-ink-soft border-paper-edge' },
};

export function LetterStatusLabel({ status }: { status: LetterStatus }) {
  const s = STATUSES[status];
  return (
    <span className={`inline-flex items-center gap-1 whitespace-nowrap rounded border px-2 py-0.5 text-xs ${s.className}`}>
      <StatusIcon name={status} />
      {s.label}
    </span>
  );
}
