import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readCertificateFile } from '@/lib/certificates/certificate-files';
import { revokeCertificate } from '@/lib/certificates/revoke-certificate';
import type { Certificate, Revision } from '@/lib/db';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { callRoute } from './support/scheme-requests';
import { createCertifiedScheme, demoCase } from './support/scheme-factory';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

type Person = Awaited<ReturnType<typeof createTestUser>>;
interface DemoCase {
  reach: { manningN: number; bedSlope: number; bedLevelAtControl: number };
  control: { crestLength: number; sillHeight: number };
  limits: { label: string; maxLevel: number; freeboard: number }[];
}

const DATUM = 'Wendle Valley local datum';
const SENSITIVITY = { manningN: 20, discharge: 20, coefficient: 10 };
// Every heading the two documents write; none may be the last words on a page.
const HEADINGS = [
  'The structure', 'The channel', 'Design flood events', 'Flood-level limits and freeboard', 'Method settings', 'Governing results',
  'Flood-level limits, as checked', 'Sensitivity and robustness of the verdict', 'Assumptions', 'Methods and their published sources',
  'Warnings from the calculation', 'Designer and independent checker', 'Caution', 'Integrity and verification',
];

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let designer: Person;
let inputs: DemoCase;
let certified: { scheme: { id: string }; revision: Revision; certificate: Certificate };
let certificatePages: string[];
let certificateBytes: Buffer;
const folder = mkdtempSync(path.join(tmpdir(), 'sillmark-certificate-text-'));
mkdirSync('tests/.artifacts', { recursive: true });

function pdfPages(pdf: Buffer, name: string): string[] {
  const file = path.join(folder, name);
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).split('\f').filter((page) => page.trim() !== '');
}

const flat = (pages: string[]) => pages.join(' ').replace(/\s+/g, ' ');

async function calculationSheet(): Promise<string[]> {
  signedInAs(designer.sessionUser);
  const response = await callRoute('schemes/[id]/calculation-sheet', 'GET', { id: certified.scheme.id, query: `revision=${certified.revision.number}` });
  expect(response.status).toBe(200);
  const bytes = Buffer.from(await response.arrayBuffer());
  writeFileSync(path.join('tests/.artifacts', 'countersigned-calculation-sheet.pdf'), bytes);
  return pdfPages(bytes, 'sheet.pdf');
}

beforeAll(async () => {
  db = await useTestDatabase();
  designer = await createTestUser('designer');
  const checker = await createTestUser('checker');
  const value = demoCase(undefined, (v) => {
    v.sensitivity = SENSITIVITY;
    v.wizard = { datum: DATUM };
  });
  inputs = value as unknown as DemoCase;
  certified = await createCertifiedScheme({ designer, checker }, value);
  await certified.revision.reload();
  certificateBytes = await readCertificateFile(certified.certificate.pdfPath);
  certificatePages = pdfPages(certificateBytes, 'certificate.pdf');
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

describe('the certificate says what it certifies', () => {
  it('names the structure, its crest level above the datum, its crest length and each coefficient with its form and unit', () => {
    const text = flat(certificatePages);
    const results = JSON.parse(certified.revision.resultsJson!) as CaseResult;
    expect(text).toContain('Broad-crested weir');
    expect(text).toContain(`Crest level ${(inputs.reach.bedLevelAtControl + inputs.control.sillHeight).toFixed(3)} m above ${DATUM}`);
    expect(text).toContain(`Sill height ${inputs.control.sillHeight.toFixed(3)} m above the bed`);
    expect(text).toContain(`Crest length ${inputs.control.crestLength.toFixed(3)} m`);
    for (const event of results.events) {
      const weir = event.control.weir!;
      expect(text).toContain(`Coefficient, ${event.name} ${weir.coefficientForm.symbol} = ${weir.coefficient.toFixed(4)} (dimensionless)`);
    }
  });

  it('names the channel, its roughness, slope and datum, and every flood-level limit with its freeboard', () => {
    const text = flat(certificatePages);
    expect(text).toContain(`Manning's n ${inputs.reach.manningN}`);
    expect(text).toContain(`Bed slope ${inputs.reach.bedSlope.toFixed(5)} m/m`);
    expect(text).toContain(`Bed level at the structure ${inputs.reach.bedLevelAtControl.toFixed(3)} m above ${DATUM}`);
    for (const limit of inputs.limits) {
      expect(text).toContain(`${limit.label} `);
      expect(text).toContain(` ${limit.maxLevel.toFixed(3)} ${limit.freeboard.toFixed(3)} ${(limit.maxLevel - limit.freeboard).toFixed(3)}`);
    }
  });

  it('lists each sensitivity run and says how robust the verdict is', () => {
    const text = flat(certificatePages);
    for (const run of ['As designed', `Manning's n ${SENSITIVITY.manningN} % higher`, `Manning's n ${SENSITIVITY.manningN} % lower`, `The discharge ${SENSITIVITY.discharge} % higher`, `The weir coefficient ${SENSITIVITY.coefficient} % higher`, `The weir coefficient ${SENSITIVITY.coefficient} % lower`]) {
      expect(text).toContain(run);
    }
    expect(text).toMatch(/The pass is robust|The check passes, but not robustly|The check fails as designed/);
  });

  it('draws the long-section of every event and ends no page with a heading', () => {
    const results = JSON.parse(certified.revision.resultsJson!) as CaseResult;
    for (const event of results.events) expect(flat(certificatePages)).toContain(`Long-section, ${event.name}`);
    for (const page of certificatePages) {
      const lines = page.split('\n').map((l) => l.trim()).filter((l) => l !== '' && !/page \d+ of \d+$/.test(l));
      const last = lines[lines.length - 1];
      expect(HEADINGS.includes(last) || last.startsWith('Long-section,')).toBe(false);
    }
    const sensitivityPage = certificatePages.find((page) => page.includes('Sensitivity and robustness of the verdict'))!;
    expect(sensitivityPage).toContain('As designed');
    writeFileSync(path.join('tests/.artifacts', 'certificate.pdf'), certificateBytes);
  });
});

describe('the certificate of a given depth', () => {
  it('says there is no crest, and that levels are above a datum even when the scheme names none', async () => {
    const checker = await createTestUser('checker');
    const depth = await createCertifiedScheme({ designer, checker }, demoCase('wendle-harrowfield-depth-control.json'));
    const text = flat(pdfPages(await readCertificateFile(depth.certificate.pdfPath), 'depth.pdf'));
    expect(text).toContain('A given depth at the control section (no crest is modelled)');
    expect(text).toContain('m above the scheme datum (not named)');
    expect(text).not.toContain('Crest level');
  });
});

describe('the calculation sheet of a countersigned revision', () => {
  it('names its certificate, lists the inputs and sensitivity, and never calls itself a draft', async () => {
    const text = flat(await calculationSheet());
    expect(text).toContain(`Status: Countersigned by `);
    expect(text).toContain(`certified by certificate ${certified.certificate.number}`);
    expect(text).toContain(`Crest level ${(inputs.reach.bedLevelAtControl + inputs.control.sillHeight).toFixed(3)} m above ${DATUM}`);
    expect(text).toContain(`Manning's n ${SENSITIVITY.manningN} % higher`);
    expect(text).not.toMatch(/not countersigned|not checked|DRAFT|draft/i);
  });

  it('says the certificate is revoked once it is, and nothing else', async () => {
    const admin = await createTestUser('admin');
    await revokeCertificate({ input: { certificateId: certified.certificate.id, reason: 'Survey datum found wrong', confirmed: true, password: admin.password }, admin: admin.sessionUser, baseUrl: 'http://localhost:3000' });
    const text = flat(await calculationSheet());
    expect(text).toContain(`Status: Countersigned; its certificate ${certified.certificate.number} was revoked on `);
    expect(text).toContain('Survey datum found wrong');
    expect(text).toContain(`REVOKED certificate ${certified.certificate.number}`);
    expect(text).not.toMatch(/certified by certificate|not countersigned|DRAFT/);
  });
});
