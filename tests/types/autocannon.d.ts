// autocannon 8 ships no type declarations; only the part tests/benchmarks/api-read.ts uses is declared.
declare module 'autocannon' {
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    headers?: Record<string, string>;
  }
  interface Histogram {
    average: number;
    mean: number;
    p50: number;
    p99: number;
    total: number;
  }
  interface Result {
    requests: Histogram;
    latency: Histogram;
    non2xx: number;
    errors: number;
    timeouts: number;
  }
  function autocannon(options: Options): Promise<Result>;
  export default autocannon;
}
