// The API under load with autocannon: each route beside a trivial signed-in route of the same server, in the same run.
import autocannon from 'autocannon';

export interface LoadTarget {
  name: string;
  path: string;
  cookie: string;
}

export interface LoadResult {
  name: string;
  path: string;
  requestsPerSecond: number;
  p50Ms: number;
  p99Ms: number;
  non2xx: number;
  errors: number;
  /** The route's first request, before the load (a cold cache where the route has one). */
  firstMs?: number;
  bytes?: number;
}

export async function runLoad(baseUrl: string, target: LoadTarget, connections: number, seconds: number): Promise<LoadResult> {
  const result = await autocannon({ url: `${baseUrl}${target.path}`, connections, duration: seconds, headers: { cookie: target.cookie } });
  return {
    name: target.name,
    path: target.path,
    requestsPerSecond: result.requests.average,
    p50Ms: result.latency.p50,
    p99Ms: result.latency.p99,
    non2xx: result.non2xx,
    errors: result.errors,
  };
}

/** Targets: every route at least 20 % of the trivial route's requests/s, p99 under 10 × its p99. */
export function judge(result: LoadResult, trivial: LoadResult): { throughputRatio: number; p99Ratio: number; ok: boolean } {
  const throughputRatio = result.requestsPerSecond / trivial.requestsPerSecond;
  const p99Ratio = result.p99Ms / Math.max(trivial.p99Ms, 1);
  return { throughputRatio, p99Ratio, ok: throughputRatio >= 0.2 && p99Ratio < 10 && result.non2xx === 0 && result.errors === 0 };
}
