import { performance } from 'node:perf_hooks';

export interface Timing {
  runs: number;
  p50Ms: number;
  p95Ms: number;
  maxMs: number;
  /**
   * CPU time of the whole process per run (user + system, garbage-collector threads included): less
   * sensitive than wall time to other programs sharing the machine, so a busy machine shows as
   * wall ≫ CPU.
   */
  cpuP50Ms: number;
  cpuP95Ms: number;
}

/** Nearest-rank percentile of a list of durations (p in 0–100). */
export function percentile(values: readonly number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  const rank = Math.max(1, Math.ceil((p / 100) * sorted.length));
  return sorted[rank - 1];
}

const round = (ms: number) => Math.round(ms * 100) / 100;

/**
 * Runs `fn` `warmup` times untimed (so the JIT has compiled it, as it has in a server that has been
 * up a while), then `runs` times timed.
 */
export function timeRuns(fn: () => unknown, runs: number, warmup = 10): Timing {
  for (let i = 0; i < warmup; i++) fn();
  const times: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < runs; i++) {
    const cpuStart = process.cpuUsage();
    const start = performance.now();
    fn();
    times.push(performance.now() - start);
    const used = process.cpuUsage(cpuStart);
    cpu.push((used.user + used.system) / 1000);
  }
  return {
    runs,
    p50Ms: round(percentile(times, 50)),
    p95Ms: round(percentile(times, 95)),
    maxMs: round(Math.max(...times)),
    cpuP50Ms: round(percentile(cpu, 50)),
    cpuP95Ms: round(percentile(cpu, 95)),
  };
}

/** Wall time of one call, in ms, with its result. */
export function timeOnce<T>(fn: () => T): { ms: number; result: T } {
  const start = performance.now();
  const result = fn();
  return { ms: performance.now() - start, result };
}
