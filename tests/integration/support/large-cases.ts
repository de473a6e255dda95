import { demoCase } from './scheme-factory';

// Large but otherwise ordinary cases built from the Harrowfield demo files: many flood events, or a long surveyed reach.

/** The prismatic broad-crested demo case with `count` flood events, their discharges spread between 5 and 35 m³/s. */
export function manyEventsCase(count: number): Record<string, unknown> {
  return demoCase('wendle-harrowfield-broad-crested.json', (c) => {
    delete c.sizing;
    c.events = Array.from({ length: count }, (_, i) => ({ name: `Event ${i + 1}`, discharge: 5 + (30 * i) / Math.max(1, count - 1) }));
  });
}

type Section = { distanceUpstream: number; points: [number, number][]; [key: string]: unknown };

/** The surveyed demo reach resurveyed at `count` cross-sections: each the nearest demo section, its levels raised with the bed. */
export function longSurveyCase(count: number): Record<string, unknown> {
  return demoCase('wendle-harrowfield-surveyed-broad-crested.json', (c) => {
    const reach = c.reach as { sections: Section[] };
    const demo = reach.sections;
    const last = demo[demo.length - 1].distanceUpstream;
    const spacing = last / (count - 1);
    reach.sections = Array.from({ length: count }, (_, i) => {
      const distance = i * spacing;
      const nearest = demo.reduce((best, s) => (Math.abs(s.distanceUpstream - distance) < Math.abs(best.distanceUpstream - distance) ? s : best));
      const rise = ((distance - nearest.distanceUpstream) * 0.6) / last;
      return { ...nearest, distanceUpstream: Number(distance.toFixed(3)), points: nearest.points.map(([x, z]) => [x, Number((z + rise).toFixed(4))] as [number, number]) };
    });
  });
}
