import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';

const API_DIR = path.resolve(import.meta.dirname, '..');

/** Starts the built API (dist/main.js) on a free port with a throwaway database. */
export async function startBuiltApi(
  env: Record<string, string> = {},
): Promise<{ baseUrl: string; databasePath: string; cpuMs: () => number | null; stop: () => Promise<void> }> {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'homeground-bench-'));
  const child: ChildProcess = spawn(
    process.execPath,
    [...(process.env.BENCH_NODE_ARGS?.split(' ') ?? []), 'dist/main.js'],
    {
      cwd: API_DIR,
      env: {
        ...process.env,
        PORT: '0',
        DATA_DIR: dataDir,
        DATABASE: path.join(dataDir, 'bench.sqlite'),
        DEMO_DATA: 'false',
        NODE_ENV: 'test',
        LOG_LEVEL: 'error',
        ...env,
      },
      stdio: ['ignore', 'pipe', 'inherit'],
    },
  );
  const baseUrl = await new Promise<string>((resolve, reject) => {
    let out = '';
    child.stdout!.on('data', (d) => {
      out += d;
      const m = out.match(/running at (http:\/\/localhost:\d+)/);
      if (m) resolve(m[1]);
    });
    child.on('exit', (code) => reject(new Error(`API exited with ${code}: ${out}`)));
  });
  return {
    baseUrl,
    databasePath: env.DATABASE ?? path.join(dataDir, 'bench.sqlite'),
    cpuMs: () => processCpuMs(child.pid),
    stop: async () => {
      const exited = new Promise((r) => child.once('exit', r));
      child.kill('SIGTERM');
      await exited;
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

/**
 * CPU time (user + system) a process has used so far, read from /proc on Linux; null elsewhere.
 * On a shared machine wall-clock latency swings with the load; the CPU a request costs the server does not.
 */
export function processCpuMs(pid: number | undefined): number | null {
  if (pid === undefined) return null;
  try {
    // Fields after the command name: state is field 3, utime and stime are fields 14 and 15 (clock ticks).
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    return ((Number(fields[11]) + Number(fields[12])) * 1000) / CLOCK_TICKS_PER_SECOND;
  } catch {
    return null;
  }
}
/** Linux's USER_HZ, 100 on every mainstream kernel configuration (common practice; `getconf CLK_TCK`). */
const CLOCK_TICKS_PER_SECOND = 100;

/** A bare node:http server answering every request with the same bytes: the ceiling to compare with. */
export async function startBareServer(
  body: Buffer,
  contentType: string,
): Promise<{ url: string; stop: () => Promise<void> }> {
  const server = http.createServer((_req, res) => {
    res.writeHead(200, { 'Content-Type': contentType, 'Content-Length': body.length });
    res.end(body);
  });
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  const { port } = server.address() as AddressInfo;
  return { url: `http://127.0.0.1:${port}`, stop: () => new Promise((r) => server.close(() => r())) };
}

/** Requests per second on loopback, bounded in time; fails loudly if any request errored. */
export async function measureThroughput(
  url: string,
  seconds = 5,
  connections = 20,
  request: { method?: 'GET' | 'POST'; headers?: Record<string, string>; body?: string } = {},
): Promise<{ rps: number; p50Ms: number; p99Ms: number }> {
  const result = await autocannon({ url, connections, duration: seconds, pipelining: 1, ...request });
  if (result.errors || result.non2xx)
    throw new Error(`${url}: ${result.errors} errors, ${result.non2xx} non-2xx answers`);
  return { rps: result.requests.average, p50Ms: result.latency.p50, p99Ms: result.latency.p99 };
}

export function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}
