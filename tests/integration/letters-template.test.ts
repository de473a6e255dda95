import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { previewLetterAction, saveLetterTemplateAction } from '@/app/(portal)/liaison/[id]/template/actions';
import { LetterTemplate, database } from '@/lib/db';
import { DEFAULT_PARAGRAPHS, listTemplateVersions, loadLetterTemplate } from '@/lib/letters/letter-template';
import { createTestRevision, createTestScheme, demoParcelsCsv } from './support/liaison-fixtures';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let liaison: Awaited<ReturnType<typeof createTestUser>>['sessionUser'];
let schemeId: string;

beforeAll(async () => {
  db = await useTestDatabase();
  liaison = (await createTestUser('liaison')).sessionUser;
  const designerId = (await createTestUser('designer')).user.id;
  const checkerId = (await createTestUser('checker')).user.id;
  schemeId = (await createTestScheme(designerId)).id;
  await createTestRevision({ schemeId, authorId: designerId, checkerId, status: 'countersigned' });
  signedInAs(liaison);
  expect((await callRoute('parcels/[id]/csv', 'POST', { id: schemeId, body: new Uint8Array(demoParcelsCsv()), headers: { 'x-file-name': 'parcels.csv' } })).status).toBe(201);
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

describe('the letter template', () => {
  it('is refused on saving when it uses an unknown placeholder, naming it, and nothing is stored', async () => {
    const result = await saveLetterTemplateAction({ schemeId, responseDays: 28, ...DEFAULT_PARAGRAPHS, introduction: 'Dear {owner_nme}, we wrote on {date}.' });
    expect(result).toMatchObject({ ok: false, issues: [{ path: 'introduction', message: expect.stringMatching(/“\{owner_nme\}”, “\{date\}”/) }] });
    database();
    expect(await LetterTemplate.count({ where: { schemeId } })).toBe(0);
  });

  it('keeps each saved version with its days to respond', async () => {
    expect(await saveLetterTemplateAction({ schemeId, responseDays: 21, ...DEFAULT_PARAGRAPHS })).toMatchObject({ ok: true, data: { version: 1 } });
    expect(await saveLetterTemplateAction({ schemeId, responseDays: 35, ...DEFAULT_PARAGRAPHS })).toMatchObject({ ok: true, data: { version: 2 } });
    expect((await LetterTemplate.findAll({ where: { schemeId }, order: [['version', 'ASC']] })).map((t) => [t.version, t.responseDays])).toEqual([[1, 21], [2, 35]]);
    expect((await loadLetterTemplate(schemeId)).responseDays).toBe(35);
    expect((await listTemplateVersions(schemeId)).map((v) => [v.version, v.responseDays, v.savedBy])).toEqual([[2, 35, liaison.name], [1, 21, liaison.name]]);
  });

  it('previews the letter for a chosen parcel, unsaved wording and all, with every placeholder filled in and nothing stored', async () => {
    const before = await LetterTemplate.count();
    const result = await previewLetterAction({ schemeId, responseDays: 14, parcelReference: 'HM-02', ...DEFAULT_PARAGRAPHS, introduction: 'To {owner_name} of {postal_address} about {parcel_reference}, {letter_date}; reply by {response_deadline}. Certificate {certificate_number}: {verification_link}. {officer_name}, {officer_role}.' });
    if (!result.ok) throw new Error(result.error);
    const { paragraphs, address, events, respondBy, letterDate } = result.data;
    expect(address).toEqual(['Edith Lowther', 'Weir Meadow Farm', 'Mill Lane', 'Harrowfield', 'HF3 2WE']);
    expect(paragraphs.introduction).toMatch(/^To Edith Lowther of Weir Meadow Farm, Mill Lane, Harrowfield, HF3 2WE about HM-02, /);
    expect(paragraphs.introduction).not.toMatch(/[{}]/);
    expect(paragraphs.introduction).toContain(`${liaison.name}, Landowner liaison officer`);
    expect(Date.parse(respondBy) - Date.parse(letterDate)).toBe(14 * 86_400_000);
    expect(events.length).toBeGreaterThan(0);
    expect(events[0]).toMatch(/In the flood/);
    expect(await LetterTemplate.count()).toBe(before);
  });
});
