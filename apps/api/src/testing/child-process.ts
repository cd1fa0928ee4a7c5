import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const API_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

/** A free port on loopback (taken by the kernel, then released for the child to use). */
export async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const address = server.address();
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return typeof address === 'object' && address ? address.port : 0;
}

export interface Child {
  readonly process: ChildProcess;
  /** Everything it printed so far. */
  output(): string;
  /** SIGKILL: the process dies at once, as in a crash or a pulled plug. */
  kill(): Promise<void>;
  /** SIGTERM, and waits for it to end. */
  stop(): Promise<void>;
}

/**
 * Starts the API server or the job worker as its own process from the sources (node with
 * tsx's loader), with this process's environment plus `extra`, and waits until it says it
 * is ready: the server's port answers, or the worker logs that it started.
 */
export async function startChild(entry: 'server' | 'worker', extra: Record<string, string>): Promise<Child> {
  const child = spawn(process.execPath, ['--import', 'tsx', `src/${entry}.ts`], {
    cwd: API_ROOT,
    env: { ...process.env, NODE_ENV: 'test', LOG_LEVEL: 'info', ...extra },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let printed = '';
  child.stdout?.on('data', (chunk: Buffer) => (printed += chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => (printed += chunk.toString()));
  const ended = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const ready = entry === 'server' ? 'Porestack API listening' : 'Porestack worker started';
  const deadline = Date.now() + 90_000;
  while (!printed.includes(ready)) {
    if (child.exitCode !== null) throw new Error(`the ${entry} process ended before it was ready:\n${printed}`);
    if (Date.now() > deadline) {
      child.kill('SIGKILL');
      throw new Error(`the ${entry} process was not ready within 90 s:\n${printed}`);
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  return {
    process: child,
    output: () => printed,
    kill: async () => {
      if (child.exitCode === null) child.kill('SIGKILL');
      await ended;
    },
    stop: async () => {
      if (child.exitCode === null) child.kill('SIGTERM');
      await ended;
    },
  };
}
