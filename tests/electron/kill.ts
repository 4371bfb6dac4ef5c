/** Spawning a TypeScript child under Node (via tsx) and killing it with SIGKILL at a chosen moment. */
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';

export interface Child {
  readonly process: ChildProcess;
  /** Every stdout line so far. */
  readonly lines: string[];
  /** Resolves when a line satisfying `test` has been printed (rejects if the child exits first). */
  waitForLine(test: (line: string) => boolean, timeoutMs?: number): Promise<string>;
  /** SIGKILL, then resolves once the process is gone. */
  kill(): Promise<void>;
}

export function spawnChild(script: string, args: readonly string[]): Child {
  const child = spawn(process.execPath, ['--import', 'tsx', path.join(import.meta.dirname, 'children', script), ...args], {
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const lines: string[] = [];
  let stderr = '';
  const waiters: { test: (line: string) => boolean; resolve: (line: string) => void }[] = [];
  let buffered = '';
  child.stdout.setEncoding('utf8').on('data', (chunk: string) => {
    buffered += chunk;
    const parts = buffered.split('\n');
    buffered = parts.pop() ?? '';
    for (const line of parts) {
      lines.push(line);
      for (const waiter of waiters.filter((w) => w.test(line))) waiter.resolve(line);
    }
  });
  child.stderr.setEncoding('utf8').on('data', (chunk: string) => (stderr += chunk));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  return {
    process: child,
    lines,
    waitForLine(test, timeoutMs = 20_000) {
      const seen = lines.find(test);
      if (seen !== undefined) return Promise.resolve(seen);
      return new Promise((resolve, reject) => {
        const timer = setTimeout(() => reject(new Error(`child printed no matching line in ${timeoutMs} ms; stderr: ${stderr}`)), timeoutMs);
        waiters.push({ test, resolve: (line) => (clearTimeout(timer), resolve(line)) });
        void exited.then(() => reject(new Error(`child exited (code ${child.exitCode}) before the line; stderr: ${stderr}`)));
      });
    },
    async kill() {
      if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
      await exited;
    },
  };
}

/** mulberry32: a small seeded generator, so the kill moments are the same on every run. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const sleep = (ms: number): Promise<void> => new Promise((resolve) => setTimeout(resolve, ms));
