// odex ships its TypeScript source beside its JavaScript, and that source does
// not pass our strict type-check; tsconfig maps 'odex' here instead. Only the
// part the reference tests use is declared.
export class Solver {
  constructor(n: number);
  absoluteTolerance: number | number[];
  relativeTolerance: number | number[];
  maxSteps: number;
  solve(
    f: (x: number, y: number[]) => number[],
    x: number,
    y0: number[],
    xEnd: number,
  ): { y: number[]; outcome: number; nStep: number; xEnd: number };
}
