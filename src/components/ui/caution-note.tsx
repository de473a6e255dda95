import { StatusIcon } from '@/components/ui/status-icon';

/** The standing caution every results and certificate page carries. */
export function CautionNote({ className = '' }: { className?: string }) {
  return (
    <p role="note" className={`border-l-4 border-verdict-caution bg-paper-deep px-4 py-3 text-sm text-ink-soft ${className}`}>
      <StatusIcon name="caution" className="mr-1" />
      <strong className="font-semibold text-ink">Caution.</strong> Sillmark’s results are estimates by the named published methods from the data entered. They support, and
      never replace, the judgement of a licensed engineer and the local codes and regulations that apply to the site.
    </p>
  );
}
