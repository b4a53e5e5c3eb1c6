// The few parts of autocannon 9 the benchmark scripts use.
declare module 'autocannon' {
  import type { EventEmitter } from 'node:events';
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    pipelining?: number;
    method?: string;
    headers?: Record<string, string>;
    body?: string;
    requests?: Array<{ method?: string; path?: string; headers?: Record<string, string>; body?: string }>;
  }
  interface Result {
    requests: { average: number; total: number };
    latency: Record<string, number>;
    errors: number;
    timeouts: number;
    non2xx: number;
    '2xx': number;
  }
  function autocannon(opts: Options, cb: (err: Error | null, result: Result) => void): EventEmitter;
  export default autocannon;
}
