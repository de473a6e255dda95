// Depth brackets for the engine's equations: a grid over a finite section, and geometric searches on open ones.
import type { Bracket } from './root-scan';
import type { FlowSection } from './section';
import { expandBracketUpward } from './solvers';
import { sortedDistinct } from './sorted-distinct';
import type { Metres } from './units';

const UNIFORM_STEPS = 400;
const SHALLOWEST_FRACTION = 1e-9;
const MAX_HALVINGS = 1100;
/** No open channel in this engine is deeper than this; an equation without a root below it means absurd inputs. */
export const DEEPEST_OPEN_DEPTH: Metres = 1e5;

export function hasBreakpoints(section: FlowSection): section is FlowSection & { breakpointDepths: readonly Metres[] } {
  // Asked by name only: a surveyed section makes the list each time it is read.
  return 'breakpointDepths' in section;
}

/**
 * Ascending depths in (from, to] for scanning a finite section: a geometric run near `from` (shallow roots),
 * a uniform run, and every depth where the ground changes slope (where the top width may jump), with a point just above it.
 */
export function finiteDepthGrid(section: FlowSection, from: Metres = 0, to: Metres = section.maxDepth): readonly Metres[] {
  // The whole-section grid is the same for every discharge; normal and critical depths of one section share it.
  const whole = from === 0 && to === section.maxDepth;
  const known = whole ? wholeSectionGrids.get(section) : undefined;
  if (known !== undefined) return known;
  const grid = depthGrid(section, from, to);
  if (whole) wholeSectionGrids.set(section, grid);
  return grid;
}

const wholeSectionGrids = new WeakMap<FlowSection, readonly Metres[]>();

/** The widest gap a tabulated section's scan leaves between two depths, as a fraction of the section's depth. */
const WIDEST_TABULATED_GAP = 1 / 32;

/**
 * For a section whose geometry is tabulated between breakpoints (a survey): its shallowest depth, every breakpoint,
 * a point just above each where the top width or the perimeter jumps (every breakpoint when the section does not
 * say), and its top, with points put in wherever two lie more than WIDEST_TABULATED_GAP of the depth apart. Between
 * two breakpoints every piece of ground is straight, so A, T and P are polynomials in the depth with no jump
 * (surveyed-table.ts) and a residual made of them is smooth: its roots show as sign changes between grid points,
 * except two roots closer together than the gap (a Froude number that rises above 1 and falls back within one
 * straight stretch of ground), which cancel, as two roots within one step of the former 400-step scan did. Why:
 * that scan cost some 450 evaluations per section; a survey has a few dozen breakpoints.
 */
export function breakpointDepthGrid(section: FlowSection & { breakpointDepths: readonly Metres[]; jumpDepths?: readonly Metres[] }): Metres[] {
  const top = section.maxDepth;
  const nudge = top * SHALLOWEST_FRACTION;
  const widestGap = top * WIDEST_TABULATED_GAP;
  const breakpoints = section.breakpointDepths;
  const jumps = section.jumpDepths ?? breakpoints;
  const grid: Metres[] = [];
  const add = (depth: Metres) => {
    if (grid.length === 0) return void grid.push(depth);
    const last = grid[grid.length - 1];
    if (!(depth > last)) return;
    const pieces = Math.ceil((depth - last) / widestGap);
    for (let k = 1; k < pieces; k++) grid.push(last + ((depth - last) * k) / pieces);
    grid.push(depth);
  };
  // One ascending walk through three ascending sources: the shallowest depth, the breakpoints, just above the jumps.
  let nudgeTaken = false;
  for (let i = 0, j = 0; !nudgeTaken || i < breakpoints.length || j < jumps.length; ) {
    const fromNudge = nudgeTaken ? Infinity : nudge;
    const fromBreakpoints = i < breakpoints.length ? breakpoints[i] : Infinity;
    const fromJumps = j < jumps.length ? Math.min(top, jumps[j] + nudge) : Infinity;
    const next = Math.min(fromNudge, fromBreakpoints, fromJumps);
    if (next === fromNudge) nudgeTaken = true;
    else if (next === fromBreakpoints) i++;
    else j++;
    if (next > 0 && next < top) add(next);
  }
  add(top);
  return grid;
}

function depthGrid(section: FlowSection, from: Metres, to: Metres): Metres[] {
  const span = to - from;
  const depths: Metres[] = [to];
  for (let i = 1; i < UNIFORM_STEPS; i++) depths.push(from + (span * i) / UNIFORM_STEPS);
  for (let fraction = SHALLOWEST_FRACTION; fraction < 1 / UNIFORM_STEPS; fraction *= 2) depths.push(from + span * fraction);
  if (hasBreakpoints(section)) {
    // A grid point just above each breakpoint keeps a jump in top width apart from any root just above it.
    const inside = section.breakpointDepths.filter((d) => d > from && d < to);
    depths.push(...inside, ...inside.map((d) => Math.min(to, d + span * SHALLOWEST_FRACTION)));
  }
  return sortedDistinct(depths);
}

/**
 * From `start`, halve the depth until f changes sign; returns the last interval [lower, higher], or null.
 * Used for roots that may lie arbitrarily close to zero depth.
 */
export function downwardBracket(f: (y: Metres) => number, start: Metres): Bracket | null {
  const startValue = f(start);
  let higher = start;
  for (let i = 0; i < MAX_HALVINGS; i++) {
    const lower = higher / 2;
    if (lower <= 0) return null;
    const value = f(lower);
    if (value === 0 || (value < 0) !== (startValue < 0)) return [lower, higher];
    higher = lower;
  }
  return null;
}

/** The sign change on (0, DEEPEST_OPEN_DEPTH] of an f that is negative when shallow and positive when deep, or null. */
export function openDepthBracket(f: (y: Metres) => number, field: string): Bracket | null {
  const startDepth = 1;
  if (f(startDepth) < 0) return expandBracketUpward(f, startDepth, 2 * startDepth, { maxHi: DEEPEST_OPEN_DEPTH, field });
  return downwardBracket(f, startDepth);
}
