import 'server-only';
import { randomUUID } from 'node:crypto';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { LetterTemplate, database } from '@/lib/db';
import { requireSchemeLiaisonAccess } from '@/lib/parcels/scheme-liaison-access';
import type { SaveLetterTemplateInput } from '@/lib/validation/letter-schemas';
import { loadLetterTemplate } from './letter-template';

/** Saves the free-text paragraphs as the scheme's next template version; letters already made keep the version they used. */
export async function saveLetterTemplate({ user, input }: { user: SessionUser; input: SaveLetterTemplateInput }) {
  const sequelize = database();
  return sequelize.transaction(async (transaction) => {
    await requireSchemeLiaisonAccess({ user, schemeId: input.schemeId, manage: true, transaction });
    const { schemeId, responseDays, ...paragraphs } = input;
    const current = await loadLetterTemplate(schemeId, transaction);
    const version = current.version + 1;
    const template = await LetterTemplate.create({ id: randomUUID(), schemeId, version, paragraphsJson: JSON.stringify(paragraphs), responseDays, updatedBy: user.id }, { transaction });
    await recordAuditEvent({ actorId: user.id, action: 'letters.template-saved', entityType: 'letter_template', entityId: template.id, schemeId, details: { version, responseDays } }, transaction);
    return { templateId: template.id, version };
  });
}
