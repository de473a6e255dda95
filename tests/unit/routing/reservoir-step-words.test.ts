import { describe, expect, it } from 'vitest';
import { casePathOfStepField, stepFieldLabel } from '@/lib/case-words/step-field-words';
import { stepOfField } from '@/lib/revisions/step-of-field';

describe('the reservoir step’s fields in words', () => {
  it('sends storage and hydrograph problems to the reservoir step', () => {
    expect(stepOfField('reservoir.storage.rows[1].area')).toBe('reservoir');
    expect(stepOfField('events[0].hydrograph.points[2].time')).toBe('reservoir');
    expect(stepOfField('events[0].discharge')).toBe('flows');
  });

  it('reads the form’s hydrographs[i] as the case file’s events[i].hydrograph, named by its event', () => {
    expect(casePathOfStepField('reservoir', 'hydrographs[0].points[2].time')).toBe('events[0].hydrograph.points[2].time');
    expect(casePathOfStepField('reservoir', 'reservoir.startLevel')).toBe('reservoir.startLevel');
    const label = stepFieldLabel('reservoir', 'hydrographs[1].timeToPeak', { units: 'SI', events: [{ name: '50% AEP' }, { name: '1% AEP' }] });
    expect(label).toContain('1% AEP');
    expect(label).toContain('time to peak');
    expect(label).not.toMatch(/hydrographs|\[|\./);
  });
});
