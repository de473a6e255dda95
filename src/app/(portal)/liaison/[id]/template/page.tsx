import type { Metadata } from 'next';
import { loadLetterTemplate } from '@/lib/letters/letter-template';
import { TEMPLATE_PLACEHOLDERS } from '@/lib/validation/letter-schemas';
import { requireLiaisonPage } from '../../_components/scheme-page-access';
import { TemplateForm } from './template-form';

export const metadata: Metadata = { title: 'Letter template' };

export default async function TemplatePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { access } = await requireLiaisonPage(id, `/liaison/${id}/template`);
  const template = await loadLetterTemplate(id);
  return (
    <div className="grid gap-10 lg:grid-cols-[2fr_1fr]">
      <TemplateForm schemeId={id} paragraphs={template.paragraphs} version={template.version} readOnly={access !== 'manage'} />
      <aside className="text-sm text-ink-soft">
        <h2 className="mb-2 text-base font-semibold text-ink">What you write, and what the engine writes</h2>
        <p>These paragraphs are yours. The section “What would change on your land” — every level, distance, depth and flow, the table and the diagram — is written from the revision’s results and cannot be edited, so a letter never quotes a number the engine did not compute.</p>
        <p className="mt-2">The caution that the figures are estimates by the named methods is always printed.</p>
        <p className="mt-2">You may use these placeholders: {TEMPLATE_PLACEHOLDERS.map((p) => <code key={p} className="num mr-1 rounded bg-paper-deep px-1">{p}</code>)}</p>
        <p className="mt-2">{template.version === 0 ? 'The standard paragraphs are in use; saving makes version 1.' : <>Version <span className="num">{template.version}</span>, saved <span className="num">{template.updatedAt?.replace('T', ' ').slice(0, 16)}</span> UTC. Letters already made keep the version they used.</>}</p>
      </aside>
    </div>
  );
}
