// Test helper: area and first moment of a section by integrating its top width with a general-purpose
// ODE solver (odex: Hairer & Wanner's GBS extrapolation code), independent of the engine's closed forms.
import { Solver } from '@/lib/hydraulics/profiles/odex-solver';

/**
 * Integrates A'(η) = T(η), M'(η) = A(η) from η = 0 to `depth`, where M = ∫₀^y (y − η) T(η) dη is the
 * first moment of the area about the surface (Leibniz rule: dM/dy = A).
 */
export function integratedAreaAndMoment(topWidthAt: (eta: number) => number, depth: number): { area: number; firstMoment: number } {
  const solver = new Solver(2);
  solver.absoluteTolerance = 1e-12;
  solver.relativeTolerance = 1e-12;
  solver.maxSteps = 100_000;
  const result = solver.solve((eta, y) => [topWidthAt(eta), y[0]], 0, [0, 0], depth);
  if (result.outcome !== 0) throw new Error(`odex did not converge (outcome ${result.outcome})`);
  return { area: result.y[0], firstMoment: result.y[1] };
}
