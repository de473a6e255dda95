/**
 * Monotone piecewise-cubic Hermite interpolation through strictly increasing data
 * (Fritsch & Carlson, "Monotone piecewise cubic interpolation", SIAM J. Numer. Anal. 17(2), 1980;
 * interior slopes by the weighted harmonic mean of Fritsch & Butland, SIAM J. Sci. Stat. Comput. 5(2), 1984;
 * end slopes by the shape-preserving three-point formula as in Moler, Numerical Computing with MATLAB, 2004, §3.4).
 */
export interface MonotoneCubic {
  at(x: number): number;
  readonly xMin: number;
  readonly xMax: number;
}

function endSlope(h0: number, h1: number, d0: number, d1: number): number {
  const slope = ((2 * h0 + h1) * d0 - h0 * d1) / (h0 + h1);
  if (Math.sign(slope) !== Math.sign(d0)) return 0;
  if (Math.sign(d0) !== Math.sign(d1) && Math.abs(slope) > 3 * Math.abs(d0)) return 3 * d0;
  return slope;
}

function nodeSlopes(xs: readonly number[], ys: readonly number[]): number[] {
  const n = xs.length;
  const widths = xs.slice(1).map((x, i) => x - xs[i]);
  const secants = widths.map((w, i) => (ys[i + 1] - ys[i]) / w);
  if (n === 2) return [secants[0], secants[0]];
  const slopes = new Array<number>(n).fill(0);
  for (let k = 1; k < n - 1; k++) {
    const [hPrev, hNext] = [widths[k - 1], widths[k]];
    const [dPrev, dNext] = [secants[k - 1], secants[k]];
    if (dPrev * dNext <= 0) continue;
    const w1 = 2 * hNext + hPrev;
    const w2 = hNext + 2 * hPrev;
    slopes[k] = (w1 + w2) / (w1 / dPrev + w2 / dNext);
  }
  slopes[0] = endSlope(widths[0], widths[1], secants[0], secants[1]);
  slopes[n - 1] = endSlope(widths[n - 2], widths[n - 3], secants[n - 2], secants[n - 3]);
  return slopes;
}

/** Interpolant through (xs[i], ys[i]); xs strictly increasing, at least two points. Clamps outside the range. */
export function monotoneCubic(xs: readonly number[], ys: readonly number[]): MonotoneCubic {
  const slopes = nodeSlopes(xs, ys);
  const last = xs.length - 1;
  return {
    xMin: xs[0],
    xMax: xs[last],
    at(x: number): number {
      if (x <= xs[0]) return ys[0];
      if (x >= xs[last]) return ys[last];
      // The interval [xs[i], xs[i + 1]] holding x, by bisection (routing reads long tables many times).
      let i = 0;
      let hi = last - 1;
      while (i < hi) {
        const mid = (i + hi + 1) >> 1;
        if (xs[mid] < x) i = mid;
        else hi = mid - 1;
      }
      const h = xs[i + 1] - xs[i];
      const t = (x - xs[i]) / h;
      // Cubic Hermite basis functions.
      const h00 = (1 + 2 * t) * (1 - t) ** 2;
      const h10 = t * (1 - t) ** 2;
      const h01 = t * t * (3 - 2 * t);
      const h11 = t * t * (t - 1);
      return h00 * ys[i] + h10 * h * slopes[i] + h01 * ys[i + 1] + h11 * h * slopes[i + 1];
    },
  };
}
