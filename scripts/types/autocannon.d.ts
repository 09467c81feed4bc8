// The part of autocannon's programmatic API the benchmarks use (the package ships no types).
declare module 'autocannon' {
  function autocannon(options: autocannon.Options): Promise<autocannon.Result>;
  namespace autocannon {
    interface Options {
      url: string;
      connections?: number;
      duration?: number;
      workers?: number;
      headers?: Record<string, string>;
    }
    interface Result {
      requests: { average: number; total: number };
      latency: { average: number; p50: number; p99: number };
      non2xx: number;
      errors: number;
      timeouts: number;
    }
  }
  export default autocannon;
}
