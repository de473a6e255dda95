import 'server-only';
import type { Transaction } from 'sequelize';
import { LetterTemplate, User, database } from '@/lib/db';
import type { LetterParagraphs } from '@/lib/validation/letter-schemas';
import { DEFAULT_RESPONSE_DAYS, letterParagraphsSchema } from '@/lib/validation/letter-schemas';

/** The paragraphs a scheme's letters start from until a liaison officer saves their own. Invented organisation and contact. */
export const DEFAULT_PARAGRAPHS: LetterParagraphs = {
  introduction:
    'We are writing to you as the owner or occupier of land beside the {watercourse} (our reference {parcel_reference}). The Wendle Valley Drainage Board keeps landowners informed about works that may change river levels next to their land.',
  scheme:
    'The scheme "{scheme_name}" at {site} would place a structure across the river. A structure like this holds the water back, so in a flood the river upstream can stand higher than it does today. Below we set out what our calculations show for your land.',
  response:
    'If you have questions or concerns, or know of anything that would change these figures (for example a field drain, a gateway or a building near the river), please tell us by {response_deadline}. You can write to us at the address below, e-mail or telephone us. Please quote our reference {parcel_reference}.',
  contact: 'Landowner liaison, Wendle Valley Drainage Board\nRiverside Office, Harrowfield\nliaison@sillmark.test',
  signOff: '{officer_name}\n{officer_role}, for the Wendle Valley Drainage Board',
};

export interface LoadedTemplate {
  id: string | null;
  version: number;
  paragraphs: LetterParagraphs;
  responseDays: number;
  updatedAt: string | null;
}

/** The scheme's latest saved template, or the default paragraphs (version 0) when none was saved. */
export async function loadLetterTemplate(schemeId: string, transaction?: Transaction): Promise<LoadedTemplate> {
  database();
  const latest = await LetterTemplate.findOne({ where: { schemeId }, order: [['version', 'DESC']], transaction });
  if (!latest) return { id: null, version: 0, paragraphs: DEFAULT_PARAGRAPHS, responseDays: DEFAULT_RESPONSE_DAYS, updatedAt: null };
  const parsed = letterParagraphsSchema.safeParse(JSON.parse(latest.paragraphsJson));
  return { id: latest.id, version: latest.version, paragraphs: parsed.success ? parsed.data : DEFAULT_PARAGRAPHS, responseDays: latest.responseDays, updatedAt: latest.createdAt };
}

/** Every saved version of the scheme's template, newest first, with who saved it: versions are kept, never overwritten. */
export async function listTemplateVersions(schemeId: string) {
  database();
  const versions = await LetterTemplate.findAll({ where: { schemeId }, order: [['version', 'DESC']] });
  const names = new Map((await User.findAll({ where: { id: versions.map((v) => v.updatedBy) }, attributes: ['id', 'name'] })).map((u) => [u.id, u.name]));
  return versions.map((v) => ({ version: v.version, savedAt: v.createdAt, savedBy: names.get(v.updatedBy) ?? 'unknown user', responseDays: v.responseDays }));
}
