// Types for ode45-cash-karp 1.1.0 (ships none): the part the flight tests use.
declare module 'ode45-cash-karp' {
  interface Integrator {
    y: number[];
    t: number;
    dt: number;
    step(tLimit?: number): boolean;
    steps(count: number, tLimit?: number): boolean;
  }
  function ode45(
    y0: number[],
    derivative: (dydt: number[], y: number[], t: number) => void,
    t0: number,
    dt0: number,
    options?: { tol?: number; verbose?: boolean; dtMaxMag?: number; dtMinMag?: number },
  ): Integrator;
  export = ode45;
}
