import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

const ROOT = path.resolve(import.meta.dirname, '..', '..', '..');

export interface RunningServer {
  baseUrl: string;
  output: () => string;
  stop: () => Promise<void>;
}

/**
 * Starts the built Homeground (api/dist serving web/dist) on a free port with a throwaway data
 * folder and the demo data, exactly as `npm start` does, and waits for its "running at" line.
 */
export async function startServer(env: Record<string, string> = {}): Promise<RunningServer> {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'homeground-browser-'));
  const child: ChildProcess = spawn(process.execPath, ['api/dist/main.js'], {
    cwd: ROOT,
    env: {
      ...process.env,
      PORT: '0',
      DATA_DIR: dataDir,
      DATABASE: path.join(dataDir, 'homeground.sqlite'),
      NODE_ENV: 'test',
      DEMO_DATA: 'true',
      // The pages sign in many demo people within a minute; the sign-in limit has its own API tests.
      LOGIN_THROTTLE_LIMIT: '1000',
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout!.on('data', (d) => (output += d));
  child.stderr!.on('data', (d) => (output += d));
  const baseUrl = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`server did not start in 60 s:\n${output}`)), 60_000);
    const check = () => {
      const m = output.match(/running at (http:\/\/localhost:\d+)/);
      if (m) {
        clearTimeout(timer);
        resolve(m[1]);
      }
    };
    child.stdout!.on('data', check);
    child.on('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`server exited with ${code}:\n${output}`));
    });
  });
  return {
    baseUrl,
    output: () => output,
    stop: async () => {
      if (child.exitCode === null) {
        const exited = new Promise((r) => child.once('exit', r));
        child.kill('SIGTERM');
        await exited;
      }
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
