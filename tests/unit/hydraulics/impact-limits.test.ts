import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { checkLimits } from '@/lib/hydraulics/impact/flood-limits';
import { at } from './test-helpers';


// Invented scenario: a with-scheme profile from 21.0 m at the weir to 20.2 m at 400 m; without-scheme level 20.0 + 0.0005·x.
const withProfile = [at(0, 21), at(200, 20.5), at(400, 20.2)];
const withoutLevelAt = (x: number) => 20 + 0.0005 * x;

describe('checkLimits', () => {
  const results = checkLimits(withProfile, withoutLevelAt, [
    { label: 'garden wall', distanceUpstream: 100, maxLevel: 21, freeboard: 0.2 },
    { label: 'road', distanceUpstream: 300, maxLevel: 20.5, freeboard: 0.2 },
    { label: 'farm gate', distanceUpstream: 1000, maxLevel: 20.6 },
  ]);

  it('passes a limit with enough room and reports its margin', () => {
    const wall = results[0];
    expect(wall.waterLevel).toBeCloseTo(20.75, 12); // halfway between 21.0 and 20.5
    expect(wall.margin).toBeCloseTo(21 - 0.2 - 20.75, 12);
    expect(wall.pass).toBe(true);
    expect(wall.afflux).toBeCloseTo(20.75 - 20.05, 12);
    expect(wall.source).toBe('profile');
  });

  it('fails a limit broken once the freeboard is counted', () => {
    const road = results[1];
    expect(road.waterLevel).toBeCloseTo(20.35, 12);
    expect(road.margin).toBeCloseTo(20.5 - 0.2 - 20.35, 12);
    expect(road.pass).toBe(false);
  });

  it('uses the without-scheme level beyond the computed profile, with freeboard 0 by default', () => {
    const gate = results[2];
    expect(gate.source).toBe('beyond-profile');
    expect(gate.waterLevel).toBeCloseTo(20.5, 12);
    expect(gate.afflux).toBe(0);
    expect(gate.freeboard).toBe(0);
    expect(gate.pass).toBe(true);
  });

  it('counts a level exactly at the limit as passing', () => {
    const [exact] = checkLimits(withProfile, withoutLevelAt, [{ label: 'sill', distanceUpstream: 0, maxLevel: 21.2, freeboard: 0.2 }]);
    expect(exact.pass).toBe(true);
  });

  it('rejects malformed limits with dotted field paths', () => {
    expect(() => checkLimits(withProfile, withoutLevelAt, [{ label: 'x', distanceUpstream: -5, maxLevel: 21 }])).toThrow(InvalidInputError);
    try {
      checkLimits(withProfile, withoutLevelAt, [{ label: 'a', distanceUpstream: 5, maxLevel: 21 }, { label: 'b', distanceUpstream: 5, maxLevel: 21, freeboard: -1 }]);
      expect.unreachable();
    } catch (error) {
      expect((error as InvalidInputError).field).toBe('limits.1.freeboard');
    }
  });
});
