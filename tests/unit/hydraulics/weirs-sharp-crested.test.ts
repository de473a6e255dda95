import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '@/lib/hydraulics/errors';
import { prismaticSection } from '@/lib/hydraulics/prismatic-sections';
import { GRAVITY, METRES_PER_FOOT } from '@/lib/hydraulics/units';
import { weirDischarge, weirHead, type WeirSpec } from '@/lib/hydraulics/weirs';
import { kindsvaterCarterCoefficient, kindsvaterCarterWidthCorrection } from '@/lib/hydraulics/weirs/kindsvater-carter';
import { rehbockCoefficient } from '@/lib/hydraulics/weirs/sharp-crested';

// Invented approach channels of our own.
const flume = prismaticSection({ shape: 'rectangular', width: 2 }, 0.012);
const wideChannel = prismaticSection({ shape: 'rectangular', width: 1.5 }, 0.012);

describe('Kindsvater–Carter coefficient', () => {
  it('is Ce = 0.602 + 0.075 h/P for a full-width weir (ISO 1438:2008, b/B = 1)', () => {
    for (const hp of [0, 0.2, 0.5, 1, 2]) expect(kindsvaterCarterCoefficient(1, hp)).toBeCloseTo(0.602 + 0.075 * hp, 12);
  });

  it('uses kb = −0.0009 m for a full-width weir (ISO 1438:2008)', () => {
    expect(kindsvaterCarterWidthCorrection(1)).toBeCloseTo(-0.0009, 12);
  });

  it('has the b/B = 0.5 row Ce = 0.592 + 0.011 h/P, kb = 0.003 m (Bos 1989 / ISO 1438 figure, from memory)', () => {
    expect(kindsvaterCarterCoefficient(0.5, 1)).toBeCloseTo(0.603, 9);
    expect(kindsvaterCarterWidthCorrection(0.5)).toBeCloseTo(0.003, 9);
  });

  it('interpolates between rows without jumps', () => {
    const below = kindsvaterCarterCoefficient(0.7499999, 0.8);
    const above = kindsvaterCarterCoefficient(0.7500001, 0.8);
    expect(Math.abs(above - below)).toBeLessThan(1e-6);
  });

  it('gives the ISO 1438 discharge for a full-width weir (b = B = 1.5 m, P = 0.5 m, h = 0.25 m)', () => {
    // Q = Ce (2/3) √(2g) (b + kb) (h + kh)^1.5 with Ce = 0.6395, kb = −0.0009, kh = 0.001 (ISO 1438:2008),
    // evaluated by hand (independently of the engine): 0.355931 m³/s.
    const spec: WeirSpec = { kind: 'sharp-crested', crestLength: 1.5, sillHeight: 0.5, channelWidth: 1.5, approachVelocity: false };
    expect(weirDischarge(spec, 0.25, wideChannel)).toBeCloseTo(0.35593099754, 9);
    expect(weirHead(spec, 0.35593099754, wideChannel).head).toBeCloseTo(0.25, 9);
  });

  it('warns outside the method range h/P ≤ 2.5 (ISO 1438:2008)', () => {
    const spec: WeirSpec = { kind: 'sharp-crested', crestLength: 1.5, sillHeight: 0.1, channelWidth: 1.5 };
    const result = weirHead(spec, 1.0, wideChannel);
    expect(result.head / 0.1).toBeGreaterThan(2.5);
    expect(result.validity.find((v) => v.name === 'head / sill height')?.ok).toBe(false);
    expect(result.warnings.some((w) => w.includes('head / sill height'))).toBe(true);
  });

  it('rejects a crest wider than the channel', () => {
    const spec: WeirSpec = { kind: 'sharp-crested', crestLength: 2, sillHeight: 0.5, channelWidth: 1.5 };
    expect(() => weirHead(spec, 0.3, wideChannel)).toThrow(InvalidInputError);
    expect(() => weirHead(spec, 0.3, wideChannel)).toThrow(/control\.crestLength/);
  });

  it('a contracted crest passes less than a full-width one at the same head', () => {
    const narrow: WeirSpec = { kind: 'sharp-crested', crestLength: 1.0, sillHeight: 0.5, channelWidth: 1.5 };
    const full: WeirSpec = { ...narrow, channelWidth: 1.0 };
    expect(weirDischarge(narrow, 0.3, wideChannel)).toBeLessThan(weirDischarge(full, 0.3, wideChannel));
  });
});

describe('Rehbock coefficient (full-width weir, no channel width given)', () => {
  it('is Cd = 0.611 + 0.08 h/P (Henderson 1966, from memory)', () => {
    expect(rehbockCoefficient(0.3, 1)).toBeCloseTo(0.635, 12);
  });

  it('matches the constant of the US-unit form C = 3.27 + 0.40 H/P (Chow 1959, from memory) to 0.01', () => {
    const gFeet = GRAVITY / METRES_PER_FOOT;
    expect((2 / 3) * Math.sqrt(2 * gFeet) * 0.611).toBeCloseTo(3.27, 2);
  });

  it('gives Q = (2/3)·Cd·√(2g)·b·h^1.5 for b = 2 m, P = 1 m, h = 0.3 m: 0.616126 m³/s (evaluated by hand)', () => {
    const spec: WeirSpec = { kind: 'sharp-crested', crestLength: 2, sillHeight: 1 };
    expect(weirDischarge(spec, 0.3, flume)).toBeCloseTo(0.6161262037, 9);
    const result = weirHead(spec, 0.6161262037, flume);
    expect(result.head).toBeCloseTo(0.3, 9);
    expect(result.coefficient).toBeCloseTo(0.635, 9);
    expect(result.coefficientIsDefault).toBe(true);
  });

  it('does not add the approach velocity a second time, and says so when asked to', () => {
    const spec: WeirSpec = { kind: 'sharp-crested', crestLength: 2, sillHeight: 1 };
    const plain = weirHead({ ...spec, approachVelocity: false }, 0.6, flume);
    const asked = weirHead({ ...spec, approachVelocity: true }, 0.6, flume);
    expect(asked.head).toBeCloseTo(plain.head, 12);
    expect(asked.warnings.some((w) => w.includes('already allows for the approach velocity'))).toBe(true);
    expect(plain.warnings.some((w) => w.includes('already allows for the approach velocity'))).toBe(false);
  });

  it('with a user Cd and no approach velocity, h = (Q / ((2/3)·Cd·√(2g)·b))^(2/3) exactly (analytic)', () => {
    const spec: WeirSpec = { kind: 'sharp-crested', crestLength: 2, sillHeight: 1, coefficient: 0.62, approachVelocity: false };
    const q = 0.8;
    const expected = (q / ((2 / 3) * 0.62 * Math.sqrt(2 * GRAVITY) * 2)) ** (2 / 3);
    const result = weirHead(spec, q, flume);
    expect(result.head).toBeCloseTo(expected, 12);
    expect(result.coefficientIsDefault).toBe(false);
  });
});
