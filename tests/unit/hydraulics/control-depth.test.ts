import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { controlDepth } from '@/lib/hydraulics/control-depth';
import { InvalidInputError } from '@/lib/hydraulics/errors';

describe('controlDepth', () => {
  it('is the sill height plus the head, and raises levels when above normal depth (common practice)', () => {
    const result = controlDepth({ sillHeight: 1.5, head: 0.9, criticalDepth: 0.8, normalDepth: 1.9 });
    expect(result.depth).toBeCloseTo(2.4, 12);
    expect(result).toMatchObject({ controls: true, causesBackwater: true, explanation: null });
  });

  it('says plainly when the structure does not raise the water above normal depth', () => {
    const result = controlDepth({ sillHeight: 0.5, head: 0.9, criticalDepth: 0.8, normalDepth: 1.9 });
    expect(result.controls).toBe(true);
    expect(result.causesBackwater).toBe(false);
    expect(result.explanation).toMatch(/no backwater/);
  });

  it('says plainly when the depth does not exceed critical depth', () => {
    const result = controlDepth({ sillHeight: 0.1, head: 0.5, criticalDepth: 0.8, normalDepth: 0.5 });
    expect(result.controls).toBe(false);
    expect(result.causesBackwater).toBe(false);
    expect(result.explanation).toMatch(/does not control/);
  });

  it('on a horizontal or adverse bed (no normal depth) any control above critical causes backwater', () => {
    expect(controlDepth({ sillHeight: 1, head: 0.5, criticalDepth: 0.8, normalDepth: null }).causesBackwater).toBe(true);
  });

  it('rejects a negative head', () => {
    expect(() => controlDepth({ sillHeight: 1, head: -0.1, criticalDepth: 0.8, normalDepth: 1 })).toThrow(InvalidInputError);
  });

  it('backwater implies control whenever normal depth is above critical (mild reach)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 3, noNaN: true }),
        fc.double({ min: 0.05, max: 3, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        (sill, head, yc, extra) => {
          const result = controlDepth({ sillHeight: sill, head, criticalDepth: yc, normalDepth: yc + extra });
          if (result.causesBackwater) expect(result.controls).toBe(true);
          expect(result.explanation === null).toBe(result.causesBackwater);
        },
      ),
    );
  });
});
