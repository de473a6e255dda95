// Type declarations for the parts of the odex package (Hairer & Wanner's ODEX, ported by C. Smith) that Sillmark uses;
// odex-solver.ts loads the package's JavaScript and types it with these declarations.

export type Derivative = (x: number, y: number[]) => number[];

export type OutputFunction = (step: number, xOld: number, x: number, y: number[], dense?: (component: number, x: number) => number) => boolean | void;

export enum Outcome {
  Converged,
  MaxStepsExceeded,
  EarlyReturn,
}

export declare class Solver {
  constructor(n: number);
  n: number;
  maxSteps: number;
  initialStepSize: number;
  maxStepSize: number;
  denseOutput: boolean;
  relativeTolerance: number | number[];
  absoluteTolerance: number | number[];
  solve(f: Derivative, x: number, y0: number[], xEnd: number, solOut?: OutputFunction): {
    y: number[];
    outcome: Outcome;
    nStep: number;
    xEnd: number;
    nAccept: number;
    nReject: number;
    nEval: number;
  };
}
