import { type ChildProcess, spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import path from 'node:path';

const API_DIR = path.resolve(import.meta.dirname, '../..');

/** The built API (`dist/main.js`) as a child process: what a real deployment runs, so it can be killed. */
export interface BuiltApi {
  baseUrl: string;
  child: ChildProcess;
  /** Everything the process printed, for the failure message when it dies unexpectedly. */
  output(): string;
  /** SIGKILL: no shutdown hooks, no flushing, as a power cut or the OOM killer would end it. */
  kill(): Promise<void>;
  /** SIGTERM and wait for the exit (the normal stop). */
  stop(): Promise<void>;
}

/** True when `npm run build` has produced the API; the tests that spawn it say so when it has not. */
export const builtApiExists = () => existsSync(path.join(API_DIR, 'dist', 'main.js'));

/**
 * Starts `node dist/main.js` on a free loopback port against `dataDir` (its SQLite file is
 * `dataDir/homeground.sqlite`), and resolves once it prints the address it listens on.
 */
export async function startBuiltApi(dataDir: string, env: Record<string, string> = {}): Promise<BuiltApi> {
  const child = spawn(process.execPath, ['dist/main.js'], {
    cwd: API_DIR,
    env: {
      PATH: process.env.PATH ?? '',
      NODE_ENV: 'test',
      PORT: '0',
      HOST: '127.0.0.1',
      DATA_DIR: dataDir,
      DATABASE: path.join(dataDir, 'homeground.sqlite'),
      WEB_DIST: path.join(dataDir, 'no-web-build'),
      DEMO_DATA: 'true',
      LOGIN_THROTTLE_LIMIT: '100',
      LOG_LEVEL: 'error',
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  child.stdout!.on('data', (d) => (out += d));
  child.stderr!.on('data', (d) => (out += d));
  const exited = new Promise<void>((r) => child.once('exit', () => r()));
  const baseUrl = await new Promise<string>((resolve, reject) => {
    child.stdout!.on('data', () => {
      const m = /running at (http:\/\/localhost:\d+)/.exec(out);
      if (m) resolve(m[1].replace('localhost', '127.0.0.1'));
    });
    child.once('exit', (code) => reject(new Error(`the API exited (${code}) before listening:\n${out}`)));
  });
  const end = async (signal: NodeJS.Signals) => {
    if (child.exitCode === null && child.signalCode === null) child.kill(signal);
    await exited;
  };
  return { baseUrl, child, output: () => out, kill: () => end('SIGKILL'), stop: () => end('SIGTERM') };
}
