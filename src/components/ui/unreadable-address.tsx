import Link from 'next/link';
import type { FieldIssue } from '@/lib/http/app-errors';

/** Shown instead of a page whose address asks for something that cannot be read, rather than quietly showing another thing. */
export function UnreadableAddress({ issues, plainHref, plainLabel }: { issues: FieldIssue[]; plainHref: string; plainLabel: string }) {
  return (
    <div role="alert" className="rounded border-l-4 border-verdict-fail bg-white/70 px-4 py-3 text-sm">
      <p className="font-semibold">This address asks for something that cannot be read, so nothing is shown for it.</p>
      <ul className="mt-2 list-disc pl-5">
        {issues.map((issue) => (
          <li key={`${issue.path}:${issue.message}`}>
            <strong>{issue.path}</strong> {issue.message}
          </li>
        ))}
      </ul>
      <p className="mt-2"><Link className="text-accent underline" href={plainHref}>{plainLabel}</Link></p>
    </div>
  );
}
