import { describe, expect, it } from 'vitest';
import type { ParcelRecord } from '@/lib/parcels/parcel-record';
import { isSearching, searchRegister } from '@/lib/parcels/search-register';
import { impactExtent, inundatedStretches } from '@/lib/plan/river-stretches';

// Expected values are worked by hand: straight lines between points cross a level where the similar triangles say.

describe('water along the river for the plan', () => {
  const levels = [
    { distance: 0, withScheme: 35.4, withoutScheme: 35.0, bank: 35.2 },
    { distance: 100, withScheme: 35.3, withoutScheme: 35.1, bank: 35.5 },
    { distance: 200, withScheme: 35.7, withoutScheme: 35.68, bank: 35.6 },
    { distance: 300, withScheme: 35.8, withoutScheme: 35.8, bank: 35.9 },
  ];

  it('finds where the water with the scheme stands above the bank, the ends by linear interpolation', () => {
    // 0→100 m: excess 0.2 falls to -0.2, crossing at 50 m; 100→200: -0.2 rises to 0.1, crossing at 166.7 m; 200→300: 0.1 to -0.1, at 250 m.
    const wet = inundatedStretches(levels);
    expect(wet).toHaveLength(2);
    expect(wet[0].from).toBe(0);
    expect(wet[0].to).toBeCloseTo(50, 9);
    expect(wet[1].from).toBeCloseTo(166.667, 3);
    expect(wet[1].to).toBeCloseTo(250, 9);
    expect(inundatedStretches(levels.map((l) => ({ ...l, bank: null })))).toEqual([]);
  });

  it('gives the extent of impact from the structure to where the rise falls below the threshold', () => {
    // Rise 0.4, 0.2, 0.02, 0: with a 0.01 m threshold it falls through 0.01 between 200 m (0.02) and 300 m (0), at 250 m.
    expect(impactExtent(levels, 0.01)!.to).toBeCloseTo(250, 6);
    // With 0.3 m it falls through between 0 m (0.4) and 100 m (0.2), at 50 m.
    expect(impactExtent(levels, 0.3)!.to).toBeCloseTo(50, 6);
    expect(impactExtent(levels, 0.5)).toBeNull();
  });
});

describe('searching the register', () => {
  const parcel = (reference: string, ownerName: string, bankSide: ParcelRecord['bankSide'], email: string | null, distanceFromM: number, groundLevelM: number | null): ParcelRecord => ({ id: reference, reference, ownerName, postalAddress: `${ownerName}, Harrowfield`, email, distanceFromM, distanceToM: distanceFromM + 100, bankSide, groundLevelM, landUse: 'grazing' });
  const parcels = [parcel('HM-10', 'Zélie Marsh', 'left', null, 900, 34.2), parcel('HM-2', 'ada Brook', 'right', 'ada@brook.test', 100, null), parcel('HM-1', 'Osric Penrose', 'left', 'o@p.test', 500, 33.9)];

  it('matches every word in any of the texts, accents and case ignored', () => {
    expect(searchRegister(parcels, { q: 'zelie harrowfield' }).map((p) => p.reference)).toEqual(['HM-10']);
    expect(searchRegister(parcels, { q: 'nobody' })).toEqual([]);
  });

  it('filters by bank and by how the owner is reached, and sorts by the chosen column', () => {
    expect(searchRegister(parcels, { bank: 'left', contact: 'email' }).map((p) => p.reference)).toEqual(['HM-1']);
    expect(searchRegister(parcels, { contact: 'post' }).map((p) => p.reference)).toEqual(['HM-10']);
    expect(searchRegister(parcels, {}).map((p) => p.reference)).toEqual(['HM-2', 'HM-1', 'HM-10']);
    expect(searchRegister(parcels, { sort: 'reference' }).map((p) => p.reference)).toEqual(['HM-1', 'HM-2', 'HM-10']);
    expect(searchRegister(parcels, { sort: 'owner' }).map((p) => p.ownerName)).toEqual(['ada Brook', 'Osric Penrose', 'Zélie Marsh']);
    expect(searchRegister(parcels, { sort: 'ground' }).map((p) => p.reference)).toEqual(['HM-1', 'HM-10', 'HM-2']);
  });

  it('counts only a real condition as a search, so the editable table stays otherwise', () => {
    expect(isSearching({})).toBe(false);
    expect(isSearching({ q: '  ', sort: 'distance' })).toBe(false);
    expect(isSearching({ sort: 'owner' })).toBe(true);
  });
});
