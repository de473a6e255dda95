import type { Metadata } from 'next';
import { revisionStanding } from '@/lib/certificates/revision-standing';
import { eventParagraph } from '@/lib/letters/letter-content';
import { ANSWERABLE } from '@/lib/letters/letter-statuses';
import { loadLetterDetail } from '@/lib/letters/load-letter';
import { LocalTime } from '@/components/ui/local-time';
import { CautionNote } from '@/components/ui/caution-note';
import { LetterStatusLabel } from '../../../_components/letter-status-label';
import { orNotFound, requireLiaisonPage } from '../../../_components/scheme-page-access';
import { ReminderPanel } from './reminder-panel';
import { ResponseForm } from './response-form';
import { ResponseList } from './response-list';

export const metadata: Metadata = { title: 'Letter' };

export default async function LetterPage({ params }: { params: Promise<{ id: string; letterId: string }> }) {
  const { id, letterId } = await params;
  const { user } = await requireLiaisonPage(id, `/liaison/${id}/letters/${letterId}`);
  const detail = await orNotFound(() => loadLetterDetail({ user, letterId }));
  const { letter, impact } = detail;
  return (
    <div className="grid gap-10 lg:grid-cols-[3fr_2fr]">
      <div>
        <h2 className="text-lg font-semibold">Letter to {detail.parcel?.ownerName} about <span className="num">{impact.parcel.reference}</span></h2>
        <dl className="mt-3 grid grid-cols-[10rem_1fr] gap-y-1 text-sm">
          <dt className="text-ink-soft">Version</dt><dd className="num">{letter.version}{letter.preliminary ? ' · PRELIMINARY' : ''}</dd>
          <dt className="text-ink-soft">From revision</dt><dd className="num">{detail.revision.number} ({revisionStanding(detail.revision)})</dd>
          <dt className="text-ink-soft">Certificate</dt><dd className="num">{impact.certificate ? impact.certificate.number : 'none cited'}</dd>
          <dt className="text-ink-soft">Status</dt><dd><LetterStatusLabel status={letter.status} />{letter.failureReason ? <span className="block text-verdict-fail">{letter.failureReason}</span> : null}</dd>
          <dt className="text-ink-soft">To</dt><dd>{letter.recipientEmail ?? 'by post'}<span className="block text-ink-soft">{detail.parcel?.postalAddress}</span></dd>
          <dt className="text-ink-soft">Made</dt><dd><LocalTime iso={letter.createdAt} /></dd>
          <dt className="text-ink-soft">{letter.postedOn ? 'Posted' : 'Sent'}</dt><dd>{letter.postedOn ? <span className="num">{letter.postedOn}</span> : <LocalTime iso={letter.sentAt} />}</dd>
          <dt className="text-ink-soft">Message-ID</dt><dd className="num break-all text-xs">{letter.messageId ?? '—'}</dd>
          <dt className="text-ink-soft">PDF SHA-256</dt><dd className="num break-all text-xs">{letter.pdfSha256}</dd>
        </dl>
        <p className="mt-3"><a className="text-accent underline" href={`/api/letters/${letter.id}`} target="_blank" rel="noreferrer">Open the PDF as sent</a></p>
        <h3 className="mt-6 font-semibold">What the letter says about the land</h3>
        {impact.events.map((e) => <p key={e.event} className="mt-2 text-sm">{eventParagraph(e, impact)}</p>)}
        <CautionNote className="mt-6" />
      </div>
      <div>
        <h2 className="text-lg font-semibold">Responses</h2>
        <ResponseList letterId={letter.id} responses={detail.responses} manage={detail.access === 'manage'} />
        {detail.access === 'manage' && ANSWERABLE.includes(letter.status) ? <ResponseForm letterId={letter.id} /> : null}
        <ReminderPanel detail={detail} manage={detail.access === 'manage'} />
      </div>
    </div>
  );
}
