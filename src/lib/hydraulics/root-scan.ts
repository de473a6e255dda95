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
