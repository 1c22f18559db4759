// One autocannon run, with latency percentiles taken from every response (autocannon's own
// report has no p95).
import autocannon from 'autocannon';

export type LoadResult = { rps: number; requests: number; errors: number; latency: { p50: number; p95: number; p99: number } };

const percentile = (sorted: number[], p: number) =>
  sorted.length ? sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))] : NaN;

export function runLoad(url: string, options: { connections: number; durationS: number; cookie?: string }): Promise<LoadResult> {
  const latencies: number[] = [];
  let errors = 0;
  return new Promise((resolve, reject) => {
    const instance = autocannon(
      { url, connections: options.connections, duration: options.durationS, headers: options.cookie ? { cookie: options.cookie } : {} },
      (error, result) => {
        if (error) return reject(error);
        latencies.sort((a, b) => a - b);
        resolve({
          rps: latencies.length / options.durationS,
          requests: latencies.length,
          errors: errors + result.errors + result.timeouts,
          latency: { p50: percentile(latencies, 50), p95: percentile(latencies, 95), p99: percentile(latencies, 99) },
        });
      },
    );
    instance.on('response', (_client, statusCode, _bytes, responseTime) => {
      if (statusCode >= 200 && statusCode < 300) latencies.push(responseTime);
      else errors += 1;
    });
  });
}
