// Roots of an equation on a finite range: scan a grid for sign changes, then refine each with Brent.
import { brentRoot } from './solvers';

export type Bracket = [number, number];

function oppositeSigns(a: number, b: number): boolean {
  return (a < 0 && b > 0) || (a > 0 && b < 0);
}

/** Every grid interval (in the grid's order) on which f changes sign; a grid point where f is 0 gives [x, x]. */
export function signChangeBrackets(f: (x: number) => number, grid: readonly number[]): Bracket[] {
  const brackets: Bracket[] = [];
  let previousX = grid[0];
  let previousF = f(previousX);
  if (previousF === 0) brackets.push([previousX, previousX]);
  for (let i = 1; i < grid.length; i++) {
    const value = f(grid[i]);
    if (value === 0) brackets.push([grid[i], grid[i]]);
    else if (oppositeSigns(previousF, value)) brackets.push([previousX, grid[i]]);
    previousX = grid[i];
    previousF = value;
  }
  return brackets;
}

/** 1 or −1 when f is proven to keep that strict sign over [from, to], 0 when it cannot be told. */
export type SignProof = (from: number, to: number) => number;

/**
 * Exactly the brackets of signChangeBrackets on an ascending grid, without evaluating f inside stretches of the grid
 * where `proof` shows one strict sign: no interval there can change sign. Walks up the grid trying a stretch twice as
 * long after each proof and half as long after each failure, evaluating f only on single intervals that no proof covers.
 */
export function provenSignChangeBrackets(f: (x: number) => number, grid: readonly number[], proof: SignProof): Bracket[] {
  if (grid.length < 2) return signChangeBrackets(f, grid);
  const brackets: Bracket[] = [];
  const last = grid.length - 1;
  // The last value found: the next single interval may start where the one before ended.
  let evaluatedAt = -1;
  let evaluated = NaN;
  const valueAt = (i: number): number => {
    if (i !== evaluatedAt) {
      evaluatedAt = i;
      evaluated = f(grid[i]);
    }
    return evaluated;
  };
  let from = 0;
  let stretch = 2;
  while (from < last) {
    const to = Math.min(last, from + stretch);
    if (to - from > 1) {
      if (proof(grid[from], grid[to]) !== 0) {
        from = to;
        stretch *= 2;
      } else stretch = (to - from) >> 1;
      continue;
    }
    const previous = valueAt(from);
    if (from === 0 && previous === 0) brackets.push([grid[0], grid[0]]);
    const value = valueAt(to);
    if (value === 0) brackets.push([grid[to], grid[to]]);
    else if (oppositeSigns(previous, value)) brackets.push([grid[from], grid[to]]);
    from = to;
    stretch = 2;
  }
  return brackets;
}

/** The first bracket met when walking the grid in its given order, or null. */
export function firstSignChange(f: (x: number) => number, grid: readonly number[]): Bracket | null {
  let previousX = grid[0];
  let previousF = f(previousX);
  if (previousF === 0) return [previousX, previousX];
  for (let i = 1; i < grid.length; i++) {
    const value = f(grid[i]);
    if (value === 0) return [grid[i], grid[i]];
    if (oppositeSigns(previousF, value)) return [previousX, grid[i]];
    previousX = grid[i];
    previousF = value;
  }
  return null;
}

/** Brent on a bracket whose ends may come in either order, to full double precision. */
export function rootInBracket(f: (x: number) => number, bracket: Bracket, field: string): number {
  const [a, b] = bracket;
  if (a === b) return a;
  return brentRoot(f, Math.min(a, b), Math.max(a, b), { tolerance: 1e-14 * Math.max(Math.abs(a), Math.abs(b)), field });
}
