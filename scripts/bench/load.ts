/** Load runs with autocannon: closed-loop at 1 and 10 connections, and open-loop at a fixed rate (-R). */
import autocannon from "autocannon";
import { requestHeaders, type Target } from "./targets";

export type LoadFigures = { reqPerS: number; p50: number; p90: number; p99: number; requests: number; errors: number; non2xx: number; bytesPerResponse: number };
export type TargetFigures = { c1: LoadFigures; c10: LoadFigures; fixed: LoadFigures };

async function run(base: string, cookie: string, target: Target, options: { connections: number; seconds: number; rate?: number }): Promise<LoadFigures> {
  const result = await autocannon({
    url: base + target.path,
    method: target.method,
    body: target.body,
    headers: requestHeaders(target, base, cookie),
    connections: options.connections,
    duration: options.seconds,
    ...(options.rate ? { overallRate: options.rate } : {}),
    timeout: 30,
    idReplacement: target.manyClients === true,
  });
  const responses = result.requests.total;
  // autocannon counts by class: for a target that should answer 4xx, those answers are not errors.
  const expected = target.expectedStatus && target.expectedStatus >= 400 && target.expectedStatus < 500 ? result["4xx"] : 0;
  return {
    reqPerS: result.requests.average,
    p50: result.latency.p50,
    p90: result.latency.p90,
    p99: result.latency.p99,
    requests: responses,
    errors: result.errors,
    non2xx: result.non2xx - expected,
    bytesPerResponse: responses > 0 ? result.throughput.total / responses : 0,
  };
}

export async function measure(base: string, cookie: string, target: Target, seconds: number, rate: number): Promise<TargetFigures> {
  // A short warm-up so the first run does not pay for cold caches and JIT.
  await run(base, cookie, target, { connections: 2, seconds: 1 });
  const c1 = await run(base, cookie, target, { connections: 1, seconds });
  const c10 = await run(base, cookie, target, { connections: 10, seconds });
  const fixed = await run(base, cookie, target, { connections: 10, seconds, rate });
  return { c1, c10, fixed };
}
