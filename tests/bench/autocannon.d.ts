// The few autocannon options and results the benchmarks use (the package ships no types).
declare module 'autocannon' {
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    headers?: Record<string, string>;
    method?: string;
    body?: string;
  }
  interface Result {
    requests: { average: number; total: number };
    latency: { p50: number; p99: number };
    non2xx: number;
    errors: number;
    timeouts: number;
  }
  export default function autocannon(options: Options): Promise<Result>;
}
