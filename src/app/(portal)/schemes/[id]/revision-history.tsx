import Link from 'next/link';
import type { RevisionHistory as History } from '@/lib/revisions/list-revision-history';
import { portalTime as when } from '@/lib/dates/portal-time';
import { StatusLabel } from '@/components/ui/status-label';
import { StartDraftButton } from './start-draft-button';

/** Every revision, newest first, with who did what and when; a submitted revision is read at /revisions/<id>. */
export function RevisionHistory({ schemeId, revisions, revokedRevisionIds, canStartDraft }: { schemeId: string; revisions: History[]; revokedRevisionIds: string[]; canStartDraft: boolean }) {
  return (
    <section aria-labelledby="history-heading">
      <h2 id="history-heading" className="mb-3 text-lg font-semibold">Revisions and history</h2>
      <ol className="space-y-4">
        {revisions.map((r) => (
          <li key={r.id} className="rounded border border-paper-edge bg-white/60 p-4">
            <div className="flex flex-wrap items-center justify-between gap-3">
              <p className="flex flex-wrap items-center gap-2">
                <Link className="font-semibold text-accent underline" href={`/revisions/${r.id}`}>Revision {r.number}</Link>
                <StatusLabel status={r.status} />
                {revokedRevisionIds.includes(r.id) ? <StatusLabel status="revoked" /> : null}
                <span className="text-sm text-ink-soft">by {r.author}, started {when(r.createdAt)}{r.basedOnNumber ? `, from revision ${r.basedOnNumber}` : ''}</span>
              </p>
              <span className="flex flex-wrap items-center gap-3 text-sm">
                <Link className="text-accent underline" href={`/schemes/${schemeId}/results?revision=${r.number}`}>Results</Link>
                <a className="text-accent underline" href={`/api/schemes/${schemeId}/case-file?revision=${r.number}`} download>Case file</a>
                {canStartDraft ? <StartDraftButton revisionId={r.id} schemeId={schemeId} number={r.number} /> : null}
              </span>
            </div>
            {r.entries.length > 0 ? (
              <details className="mt-2 text-sm">
                <summary className="cursor-pointer text-ink-soft">What changed ({r.entries.length})</summary>
                <table className="mt-2 w-full border-collapse">
                  <caption className="sr-only">History of revision {r.number}</caption>
                  <thead><tr className="border-b border-paper-edge text-left text-ink-soft"><th scope="col" className="py-1 pr-3">When</th><th scope="col" className="py-1 pr-3">Who</th><th scope="col" className="py-1">What</th></tr></thead>
                  <tbody>
                    {r.entries.map((e, i) => (
                      <tr key={i} className="border-b border-paper-edge align-top">
                        <td className="num whitespace-nowrap py-1 pr-3">{when(e.at)}</td>
                        <td className="py-1 pr-3">{e.actor}</td>
                        <td className="py-1">{e.summary}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </details>
            ) : null}
          </li>
        ))}
      </ol>
    </section>
  );
}
