import { describe, expect, it } from 'vitest';
import { Letter } from '@/lib/db';
import { inviteUserAction } from '@/app/(portal)/admin/users/actions';
import { addReviewCommentAction } from '@/app/(portal)/checks/[id]/actions';
import { logLetterResponseAction } from '@/app/(portal)/liaison/[id]/letters/[letterId]/actions';
import { expectRefusal, refusalOf, withoutChange } from './support/hostile-checks';
import { caseFileText } from './support/liaison-fixtures';
import { usePortalWorld } from './support/portal-world';
import { callRoute, SCHEME_STEP } from './support/scheme-requests';
import { signedInAs } from './support/session-double';

// Issue 14 §8: input that used to be stored, or silently ignored, is refused with a message naming the field.

const portal = usePortalWorld();
const as = (person: 'designer' | 'checker' | 'liaison' | 'admin' | 'planning') => signedInAs(portal.world.people[person].sessionUser);

const HIDDEN = { NUL: '\u0000', BEL: '\u0007', ESC: '\u001b[31m', 'right-to-left override': '\u202E', 'left-to-right isolate': '\u2066' };
const importCase = (text: string) => callRoute('schemes/import', 'POST', { body: text, headers: { 'content-type': 'application/json', 'x-file-name': 'case.json' } });
const withScheme = (scheme: unknown) => JSON.stringify({ ...JSON.parse(caseFileText()), scheme });

describe('control characters and line breaks in text', () => {
  for (const [name, character] of Object.entries(HIDDEN)) {
    it(`refuses ${name} in a scheme’s name and in a checker’s comment`, async () => {
      as('designer');
      const created = await withoutChange(() => callRoute('schemes', 'POST', { json: { ...SCHEME_STEP, name: `Harrowfield${character} weir` } }));
      expectRefusal(await refusalOf(created), { field: 'name', label: `scheme name with ${name}` });
      as('checker');
      const comment = await withoutChange(() => addReviewCommentAction({ revisionId: portal.world.submitted.revisionId, part: 'channel', body: `Check the roughness${character} again` }));
      expect(comment.ok).toBe(false);
      expect(comment.ok ? [] : comment.issues).toEqual(expect.arrayContaining([expect.objectContaining({ path: 'body', message: expect.stringMatching(/control characters|direction of text/) })]));
    });
  }

  it('refuses a line break in a one-line field (a name that would start a new e-mail header), not in a comment', async () => {
    as('admin');
    const invited = await withoutChange(() => inviteUserAction({ email: 'new.engineer@wendle-valley.test', name: 'New Engineer\r\nBcc: everyone@example.org', role: 'checker' }));
    expect(invited.ok).toBe(false);
    expect(invited.ok ? [] : invited.issues).toEqual([{ path: 'name', message: 'must be on one line, without line breaks (the person’s name)' }]);
    as('checker');
    const comment = await addReviewCommentAction({ revisionId: portal.world.submitted.revisionId, part: 'channel', body: 'Two points:\n1. the roughness\n2. the bed slope' });
    expect(comment.ok).toBe(true);
  });
});

describe('dates', () => {
  it('refuses a response dated on a day that does not exist, or before the letter was sent', async () => {
    as('liaison');
    const { letterId } = portal.world.letters;
    const impossible = await withoutChange(() => logLetterResponseAction({ letterId, receivedOn: '2026-02-30', responseType: 'no-objection', channel: 'telephone', summary: 'Owner telephoned; no objection.' }));
    expect(impossible.ok ? [] : impossible.issues).toEqual([{ path: 'receivedOn', message: expect.stringContaining('2026-02-30 does not exist') }]);
    await Letter.update({ status: 'sent', sentAt: '2026-01-20T09:30:00.000Z' }, { where: { id: letterId } });
    const early = await withoutChange(() => logLetterResponseAction({ letterId, receivedOn: '2026-01-19', responseType: 'no-objection', channel: 'telephone', summary: 'Owner telephoned; no objection.' }));
    expect(early.ok ? [] : early.issues).toEqual([{ path: 'receivedOn', message: 'must be on or after 2026-01-20, the day the letter was sent' }]);
    const sameDay = await logLetterResponseAction({ letterId, receivedOn: '2026-01-20', responseType: 'no-objection', channel: 'telephone', summary: 'Owner telephoned; no objection.' });
    expect(sameDay.ok).toBe(true);
  });
});

describe('query parameters that cannot be read', () => {
  const cases = (): [string, string, { id?: string; query: string }, 'designer' | 'liaison' | 'planning', string][] => {
    const { certified } = portal.world;
    return [
      ['a month 13', 'certificates', { query: 'from=2026-13-45' }, 'planning', 'from'],
      ['30 February', 'certificates', { query: 'to=2026-02-30' }, 'planning', 'to'],
      ['a register version that is not a number', 'parcels/[id]', { id: certified.schemeId, query: 'version=abc' }, 'liaison', 'version'],
      ['an over-long revision id', 'parcels/[id]/impact', { id: certified.schemeId, query: `revision=${'a'.repeat(65)}` }, 'liaison', 'revision'],
      ['a revision number that is not a number', 'schemes/[id]/step-table', { id: certified.schemeId, query: 'revision=abc' }, 'designer', 'revision'],
      ['an event that is not a number', 'schemes/[id]/step-table', { id: certified.schemeId, query: 'revision=1&event=abc' }, 'designer', 'event'],
      ['an event given twice', 'schemes/[id]/step-table', { id: certified.schemeId, query: 'revision=1&event=0&event=1' }, 'designer', 'event'],
      ['a survey upload for an id that is not one', 'uploads/survey-preview', { query: `revision=${encodeURIComponent('../x')}` }, 'designer', 'revision'],
    ];
  };

  it('answers each with 400 naming the parameter', async () => {
    for (const [label, route, options, person, field] of cases()) {
      as(person);
      const method = route.startsWith('uploads/') ? 'POST' : 'GET';
      const response = await callRoute(route, method, { ...options, body: method === 'POST' ? 'Section,Offset,Level\n' : undefined, headers: method === 'POST' ? { 'content-type': 'text/csv' } : undefined });
      expectRefusal(await refusalOf(response), { field, label });
    }
  });

  it('still serves the same addresses when the parameters are right', async () => {
    const { certified } = portal.world;
    as('planning');
    expect((await callRoute('certificates', 'GET', { query: 'from=2024-02-29&to=2099-12-31' })).status).toBe(200);
    as('liaison');
    expect((await callRoute('parcels/[id]', 'GET', { id: certified.schemeId, query: 'version=1' })).status).toBe(200);
    expect((await callRoute('parcels/[id]/impact', 'GET', { id: certified.schemeId, query: `revision=${certified.revisionId}` })).status).toBe(200);
  });
});

describe('a case file’s scheme block', () => {
  const bad: [string, unknown, string][] = [
    ['a name that is a number', { name: 123 }, 'scheme.name'],
    ['a site over two lines', { site: 'Harrowfield\nMill' }, 'scheme.site'],
    ['an empty watercourse', { watercourse: '' }, 'scheme.watercourse'],
    ['a governing event the case does not have', { governing: 7 }, 'scheme.governing'],
    ['a block that is not an object', 'Harrowfield Mill', 'scheme'],
  ];
  for (const [label, scheme, field] of bad) {
    it(`refuses ${label} with 400, storing nothing`, async () => {
      as('designer');
      const response = await withoutChange(() => importCase(withScheme(scheme)));
      expectRefusal(await refusalOf(response), { field, label });
    });
  }

  it('imports a right block', async () => {
    as('designer');
    const response = await importCase(withScheme({ name: 'Harrowfield Mill sluice', watercourse: 'River Wendle', site: 'Harrowfield Mill', governing: 1 }));
    expect(response.status).toBe(201);
  });
});
