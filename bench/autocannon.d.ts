// The part of autocannon's API the load bench uses (the package ships no types).
declare module 'autocannon' {
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    headers?: Record<string, string>;
  }
  interface Result {
    requests: { average: number };
    latency: { p50: number; p99: number };
    non2xx: number;
    errors: number;
  }
  export default function autocannon(options: Options): Promise<Result>;
}
