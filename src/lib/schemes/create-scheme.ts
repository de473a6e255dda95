import 'server-only';
import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Scheme, database } from '@/lib/db';
import { ForbiddenError } from '@/lib/http/app-errors';
import { applyWizardStep } from '@/lib/revisions/apply-wizard-step';
import { createDraft } from '@/lib/revisions/create-draft';
import { emptyDraft } from '@/lib/revisions/draft-inputs';
import type { NewSchemeInput } from '@/lib/validation/scheme-schemas';

/** The next free reference, SM-0001, SM-0002, … (read inside the writing transaction, so two designers never share one). */
export async function nextSchemeReference(transaction: Transaction): Promise<string> {
  const references = (await Scheme.findAll({ attributes: ['reference'], transaction })).map((s) => /^SM-(\d+)$/.exec(s.reference)?.[1]);
  const highest = Math.max(0, ...references.map((n) => Number(n ?? 0)));
  return `SM-${String(highest + 1).padStart(4, '0')}`;
}

/** Step 1 of the wizard: a new scheme with its first draft revision, owned by the designer who made it. */
export async function createScheme({ input, designer }: { input: NewSchemeInput; designer: SessionUser }) {
  if (designer.role !== 'designer') throw new ForbiddenError('Only designers create schemes.');
  const sequelize = database();
  return sequelize.transaction(async (transaction) => {
    const scheme = await Scheme.create(
      { id: randomUUID(), reference: await nextSchemeReference(transaction), name: input.name, watercourse: input.watercourse, site: input.site, description: input.description || null, designerId: designer.id },
      { transaction },
    );
    await recordAuditEvent({ actorId: designer.id, action: 'scheme.created', entityType: 'scheme', entityId: scheme.id, schemeId: scheme.id, details: { reference: scheme.reference, name: scheme.name, units: input.units } }, transaction);
    const inputs = applyWizardStep(emptyDraft(input.units), { step: 'scheme', values: input });
    const revision = await createDraft({ schemeId: scheme.id, authorId: designer.id, inputs, wizardStep: 'channel', basedOn: null, origin: 'new scheme', transaction });
    return { schemeId: scheme.id, reference: scheme.reference, revisionId: revision.id, revisionNumber: revision.number };
  });
}
