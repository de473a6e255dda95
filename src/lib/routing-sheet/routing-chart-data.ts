import type { RoutingResult, RoutingStep } from '@/lib/hydraulics/routing/routing-result';
import { hoursOf } from './event-routing';

export interface TimePoint {
  x: number;
  y: number;
}

export interface RoutingChartData {
  inflow: TimePoint[];
  outflow: TimePoint[];
  level: TimePoint[];
  /** The three peaks, marked on the chart and named in its caption. */
  peaks: { inflow: TimePoint; outflow: TimePoint; level: TimePoint };
}

/** The routing as three series against time in hours: inflow and outflow on the discharge axis, level on the level axis. */
export function routingChartData(routing: RoutingResult): RoutingChartData {
  const at = (pick: (s: RoutingStep) => number) => routing.steps.map((s) => ({ x: hoursOf(s.time), y: pick(s) }));
  return {
    inflow: at((s) => s.inflow),
    outflow: at((s) => s.outflow),
    level: at((s) => s.level),
    peaks: {
      inflow: { x: hoursOf(routing.inflowPeak.time), y: routing.inflowPeak.discharge },
      outflow: { x: hoursOf(routing.outflowPeak.time), y: routing.outflowPeak.discharge },
      level: { x: hoursOf(routing.peakLevel.time), y: routing.peakLevel.level },
    },
  };
}

/**
 * At most `max` rows of the routing table, evenly spaced in time, always with the first and last rows and the rows
 * nearest each peak: the chart's text alternative, short enough to read.
 */
export function sampledSteps(routing: RoutingResult, max: number): RoutingStep[] {
  const steps = routing.steps;
  if (steps.length <= max) return steps;
  const nearest = (time: number) => steps.reduce((best, s, i) => (Math.abs(s.time - time) < Math.abs(steps[best].time - time) ? i : best), 0);
  const keep = new Set<number>([0, steps.length - 1, nearest(routing.inflowPeak.time), nearest(routing.outflowPeak.time), nearest(routing.peakLevel.time)]);
  const spread = Math.max(1, max - keep.size);
  for (let k = 1; k < spread && keep.size < max; k++) keep.add(Math.round((k * (steps.length - 1)) / spread));
  return [...keep].sort((a, b) => a - b).map((i) => steps[i]);
}
