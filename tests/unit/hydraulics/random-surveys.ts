// Test helper: invented grounds for property tests, random polylines with flat runs and walls between two high ends,
// with three sub-areas of differing Manning's n.
import fc from 'fast-check';

const interior = fc.array(fc.tuple(fc.integer({ min: 0, max: 4 }), fc.integer({ min: 0, max: 40 })), { minLength: 2, maxLength: 25 });

export const randomSurvey = fc.tuple(interior, fc.double({ min: 0.01, max: 0.1, noNaN: true }), fc.double({ min: 0.01, max: 0.1, noNaN: true })).map(([steps, nChannel, nBanks]) => {
  let station = 0;
  const points: [number, number][] = [[0, 106]];
  for (const [step, tenths] of steps) points.push([(station += step), 100 + tenths / 10]);
  points.push([station + 1, 106]);
  const width = station + 1;
  return { points, manningN: { left: nBanks, channel: nChannel, right: 1.5 * nBanks }, bankStations: [0.3 * width, 0.7 * width] as [number, number] };
});
