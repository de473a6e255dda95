import type { Metadata } from 'next';
import { listTemplateVersions, loadLetterTemplate } from '@/lib/letters/letter-template';
import { LocalTime } from '@/components/ui/local-time';
import { loadParcelRegister } from '@/lib/parcels/load-parcel-register';
import { PLACEHOLDERS, PLACEHOLDER_NAMES } from '@/lib/validation/letter-placeholders';
import { requireLiaisonPage } from '../../_components/scheme-page-access';
import { TemplateForm } from './template-form';

export const metadata: Metadata = { title: 'Letter template' };

export default async function TemplatePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { user, access } = await requireLiaisonPage(id, `/liaison/${id}/template`);
  const template = await loadLetterTemplate(id);
  const { parcels } = await loadParcelRegister({ user, schemeId: id });
  const versions = await listTemplateVersions(id);
  return (
    <div className="grid gap-10 lg:grid-cols-[2fr_1fr]">
      <TemplateForm schemeId={id} paragraphs={template.paragraphs} responseDays={template.responseDays} version={template.version} readOnly={access !== 'manage'} parcels={parcels.map((p) => ({ reference: p.reference, ownerName: p.ownerName }))} />
      <aside className="text-sm text-ink-soft">
        <h2 className="mb-2 text-base font-semibold text-ink">What you write, and what the engine writes</h2>
        <p>These paragraphs are yours. The section “What would change on your land” — every level, distance, depth and flow, the table and the diagram — is written from the revision’s results and cannot be edited, so a letter never quotes a number the engine did not compute.</p>
        <p className="mt-2">The caution that the figures are estimates by the named methods is always printed. The same letter goes by e-mail (as an attached PDF) and by post, so write it to be read on paper.</p>
        <h3 className="mt-4 font-semibold text-ink">Placeholders</h3>
        <p>Type one in braces and each letter fills it in. A placeholder the letter does not know is refused when you save.</p>
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-2 gap-y-1">
          {PLACEHOLDER_NAMES.map((name) => (
            <div key={name} className="contents">
              <dt><code className="num rounded bg-paper-deep px-1">{`{${name}}`}</code></dt>
              <dd>{PLACEHOLDERS[name]}</dd>
            </div>
          ))}
        </dl>
        <p className="mt-4">{template.version === 0 ? 'The standard paragraphs are in use; saving makes version 1.' : 'Letters already made keep the version they used.'}</p>
        {versions.length > 0 ? (
          <>
            <h3 className="mt-4 font-semibold text-ink">Saved versions</h3>
            <ul className="mt-1 space-y-1" data-testid="template-versions">
              {versions.map((v) => <li key={v.version}>Version <span className="num">{v.version}</span>: <LocalTime iso={v.savedAt} />, by {v.savedBy}; <span className="num">{v.responseDays}</span> days to respond</li>)}
            </ul>
          </>
        ) : null}
      </aside>
    </div>
  );
}
