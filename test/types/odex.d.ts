// Types for the parts of the `odex` package the reference tests use. (The package ships its
// TypeScript source, which does not compile under our strict settings, so the test type check
// reads this declaration instead; see tsconfig.test.json.)
declare module 'odex' {
  export class Solver {
    constructor(n: number);
    absoluteTolerance: number | number[];
    relativeTolerance: number | number[];
    denseOutput: boolean;
    initialStepSize: number;
    maxSteps: number;
    grid(step: number, output: (x: number, y: number[]) => void): unknown;
    solve(
      f: (x: number, y: number[]) => number[],
      x0: number,
      y0: number[],
      x1: number,
      output?: unknown,
    ): { y: number[]; outcome: number };
  }
}
