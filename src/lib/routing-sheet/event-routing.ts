import type { EventResult } from '@/lib/hydraulics/case-result';
import type { RoutingResult, Seconds } from '@/lib/hydraulics/routing/routing-result';

/** The routing of one event, or null: results stored before routing existed carry no `routing` at all. */
export function eventRouting(event: EventResult): RoutingResult | null {
  return event.routing ?? null;
}

/** The sheets give times in hours, as the designer enters them; the engine keeps seconds. */
export function hoursOf(time: Seconds): number {
  return time / 3600;
}

/** "3.25 h" — or minutes when shorter than an hour, so a short lag does not read as 0.00 h. */
export function durationWords(time: Seconds): string {
  const hours = hoursOf(time);
  if (Math.abs(hours) < 1 && time !== 0) return `${(time / 60).toFixed(1)} min`;
  return `${hours.toFixed(2)} h`;
}

/** x.toFixed(d) without the minus of a value that rounds to zero ("-0.0" reads as a loss). */
export function fixedWithoutNegativeZero(x: number, digits: number): string {
  const text = x.toFixed(digits);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

export function volumeUnit(length: string): string {
  return `${length}³`;
}

export function areaUnit(length: string): string {
  return `${length}²`;
}
