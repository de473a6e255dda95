import { describe, expect, it } from 'vitest';
import { CASE_FIELDS } from '@/lib/case-words/case-field-dictionary';
import { caseIssueInWords, engineIssueInWords, engineTextInWords } from '@/lib/case-words/case-issue-words';
import { describeCaseField } from '@/lib/case-words/describe-case-field';
import { casePathOfStepField, stepFieldLabel } from '@/lib/case-words/step-field-words';
import { stepOfField } from '@/lib/revisions/step-of-field';
import { caseSchema } from '@/lib/validation/case-schema';
import { rawFieldPaths } from '../../support/raw-field-paths';
import { schemaPaths } from './schema-paths';

const paths = [...schemaPaths(caseSchema)];
const caseFile = {
  units: 'SI',
  events: [{ name: '1% AEP' }, { name: '' }],
  limits: [{ label: 'Mill Lane cottages' }, { label: 'y'.repeat(5000) }],
  reach: { kind: 'surveyed', sections: [{ distanceUpstream: 0 }, { distanceUpstream: 120 }] },
};

describe('the dictionary of case-file fields', () => {
  it('walks the whole case schema (so a field added to it is seen here)', () => {
    expect(paths.length).toBeGreaterThan(80);
    for (const known of ['control.sillHeight', 'limits[].distanceUpstream', 'events[].annualExceedanceProbability', 'reach.sections[].points[][1]', 'reach.sections[].manningN.left', 'sizing.robust']) expect(paths).toContain(known);
  });

  it('has a label, and a wizard step, for every path of the case schema', () => {
    const missing = paths.filter((p) => CASE_FIELDS[p] === undefined);
    expect(missing).toEqual([]);
    for (const p of paths) expect(CASE_FIELDS[p].label.trim(), p).not.toBe('');
    for (const top of paths.filter((p) => !/[.[]/.test(p))) expect(CASE_FIELDS[top].step, top).toBeDefined();
  });

  it('lists no path the case schema does not have', () => {
    expect(Object.keys(CASE_FIELDS).filter((p) => !paths.includes(p))).toEqual([]);
  });

  it('names every field of a concrete case file in words, with no path left in', () => {
    for (const pattern of paths) {
      const concrete = pattern.replace(/\[\]/g, '[1]');
      const { label } = describeCaseField(concrete, caseFile);
      expect(rawFieldPaths(label), `${concrete} → ${label}`).toEqual([]);
    }
  });

  it('names list items by their own names, or by their place when they have none', () => {
    expect(describeCaseField('limits[0].distanceUpstream', caseFile)).toEqual({ label: 'flood-level limit “Mill Lane cottages”: distance upstream', unit: 'm', step: 'limits' });
    expect(describeCaseField(['events', 0, 'discharge'], caseFile).label).toBe('flood event “1% AEP”: peak discharge');
    expect(describeCaseField('events[1].name', caseFile).label).toBe('flood event 2: name');
    expect(describeCaseField('reach.sections[1].points[3][1]', caseFile)).toEqual({ label: 'cross-section 2 (120 m upstream): point 4: ground level', unit: 'm above datum', step: 'channel' });
    expect(describeCaseField('limits[1].label', caseFile).label.length).toBeLessThan(100);
    expect(describeCaseField('control.sillHeight', { units: 'US' })).toEqual({ label: 'proposed structure: sill height above the bed', unit: 'ft above the bed', step: 'structure' });
  });

  it('sends each field to the wizard step where it is entered', () => {
    expect(stepOfField('reach.length')).toBe('scheme');
    expect(stepOfField('reach.section.width')).toBe('channel');
    expect(stepOfField('reach.sections[2].bankLevel')).toBe('limits');
    expect(stepOfField('events[0].discharge')).toBe('flows');
    expect(stepOfField('existingControl.depth')).toBe('structure');
    expect(stepOfField('sensitivity.manningN')).toBe('limits');
  });

  it('reads the wizard forms’ own paths as the case file’s', () => {
    expect(casePathOfStepField('channel', 'section.width')).toBe('reach.section.width');
    expect(casePathOfStepField('scheme', 'reachLength')).toBe('reach.length');
    expect(casePathOfStepField('limits', 'sectionBankLevels[2]')).toBe('reach.sections[2].bankLevel');
    expect(stepFieldLabel('flows', 'events[0].discharge', caseFile)).toBe('flood event “1% AEP”: peak discharge');
    expect(stepFieldLabel('flows', 'governing')).toBe('flood event that governs');
  });
});

describe('messages in words', () => {
  it('puts the field in words before the reason', () => {
    expect(caseIssueInWords({ path: 'limits[0].maxLevel', message: 'must be a number (m)' }, caseFile)).toEqual({ path: 'limits[0].maxLevel', message: 'Flood-level limit “Mill Lane cottages”: highest allowed level must be a number (m)' });
    expect(caseIssueInWords({ path: 'format', message: 'is required' }, {}).message).toMatch(/^This is not a Sillmark case file/);
    expect(caseIssueInWords({ path: 'format', message: 'x' }, { format: 'z'.repeat(10_000) }).message.length).toBeLessThan(200);
  });

  it('translates the engine’s paths at the boundary', () => {
    expect(engineTextInWords('events[0].returnPeriod: 100 years gives …', caseFile)).toBe('Flood event “1% AEP”: return period: 100 years gives …');
    expect(engineTextInWords('reach.1.distanceUpstream: sections must be in order', caseFile)).toBe('Cross-section 2 (120 m upstream): distance upstream: sections must be in order');
    expect(engineTextInWords('The profile was cut short.')).toBe('The profile was cut short.');
    expect(engineIssueInWords({ field: 'control.crestLength', message: 'control.crestLength: must be greater than 0' })).toEqual({ path: 'control.crestLength', message: 'Proposed structure: crest length: must be greater than 0' });
  });
});
