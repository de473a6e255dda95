import { createRequire } from 'node:module';
import type { Solver as OdexSolver } from './odex-types';

// odex (Hairer & Wanner's ODEX, Gragg–Bulirsch–Stoer extrapolation) ships TypeScript sources that fail this project's
// strict type checks, so its published JavaScript is loaded here and typed by odex-types.d.ts.
export const Solver = (createRequire(import.meta.url)('odex') as { Solver: typeof OdexSolver }).Solver;
export type Solver = OdexSolver;
