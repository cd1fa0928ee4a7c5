/**
 * Load benchmark: many signed-in clients at once against the portal as it runs in
 * production (compiled JavaScript, started with node), on loopback.
 *
 *   source .run/services.env && pnpm --filter @porestack/api run build && pnpm --filter @porestack/api bench:load
 *
 * Seeds an organisation with BENCH_TESTS analysed tests (default 40) and BENCH_CLIENTS
 * members (default 100), signs each in with its own session, starts the API (BENCH_API
 * processes, default as many as API_PROCESSES would) and measures with autocannon, each
 * connection carrying its own session cookie: the tests list, a test's detail, and for the
 * floor a bare Express route in a process of its own. Prints requests/s, latency
 * percentiles, errors and the machine's load average.
 */
import './bench-env.js';
import 'reflect-metadata';
import { spawn, type ChildProcess } from 'node:child_process';
import { openSync } from 'node:fs';
import { connect } from 'node:net';
import { loadavg, tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import { createApp } from '../src/app.js';
import { dataSource } from '../src/data-source.js';
import { createMember, openBrowser, signUpAdmin } from '../src/testing/browser.js';
import { freePort } from '../src/testing/child-process.js';
import { analysedTest } from '../src/testing/lab-fixtures.js';

const CLIENTS = Number(process.env['BENCH_CLIENTS'] ?? 100);
const TESTS = Number(process.env['BENCH_TESTS'] ?? 40);
const SECONDS = Number(process.env['BENCH_SECONDS'] ?? 15);
const API_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

await dataSource.initialize();
await dataSource.runMigrations({ transaction: 'each' });

// The lab: one organisation, its tests, and the people who read them.
const app = createApp();
const admin = await signUpAdmin(app, 'load-admin');
const technician = await createMember(admin.orgId, 'technician', 'load-tech');
const testIds: string[] = [];
for (let i = 0; i < TESTS; i += 1) testIds.push((await analysedTest(admin.orgId, technician.userId)).testId);
const people = await Promise.all(Array.from({ length: CLIENTS }, (_, i) => createMember(admin.orgId, i % 2 === 0 ? 'lab_manager' : 'technician', `load-${i}`)));

/** Starts a process whose log goes to a file (as npm start's does), and waits for its port. */
async function start(script: string[], env: Record<string, string>, port: number): Promise<ChildProcess> {
  const log = openSync(path.join(tmpdir(), `porestack-load-${port}.log`), 'w');
  const child = spawn(process.execPath, script, { cwd: API_ROOT, env: { ...process.env, ...env }, stdio: ['ignore', log, log] });
  const deadline = Date.now() + 60_000;
  while (!(await answers(port))) {
    if (child.exitCode !== null || Date.now() > deadline) throw new Error(`could not start ${script.join(' ')}: see ${path.join(tmpdir(), `porestack-load-${port}.log`)}`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  return child;
}

function answers(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = connect(port, '127.0.0.1', () => {
      socket.end();
      resolve(true);
    });
    socket.on('error', () => resolve(false));
  });
}

const port = await freePort();
const api = await start(['dist/src/server.js'], { NODE_ENV: 'production', PORT: String(port), LOG_LEVEL: 'info', SIGN_IN_CLIENT_RATE_LIMIT: '100000' }, port);
const base = `http://127.0.0.1:${port}`;
const floorPort = await freePort();
const floor = await start(
  ['--input-type=module', '-e', `import express from 'express'; const app = express(); app.get('/bare', (_q, r) => r.json({ ok: true })); app.listen(${floorPort}, '127.0.0.1', () => console.log('listening'));`],
  {},
  floorPort,
);

// Each client signs in for a session of its own, as a browser would.
const cookies: string[] = [];
for (const person of people) {
  const browser = await openBrowser(base);
  await browser.post('/api/auth/sign-in', { email: person.email, password: 'correct-horse-battery' }).expect(200);
  const cookie = browser.agent.jar.getCookie('porestack_session', { domain: '127.0.0.1', path: '/', secure: false, script: false });
  cookies.push(`porestack_session=${cookie?.value ?? ''}`);
}

interface Figures {
  label: string;
  rps: number;
  p50: number;
  p95: number;
  p99: number;
  errors: number;
  non2xx: number;
}

async function measure(label: string, url: string, paths: string[], withSessions: boolean): Promise<Figures> {
  let next = 0;
  const result = await autocannon({
    url,
    connections: CLIENTS,
    duration: SECONDS,
    requests: [{ method: 'GET', setupRequest: (request) => ({ ...request, path: paths[(next += 1) % paths.length] as string }) }],
    ...(withSessions ? { setupClient: (client: autocannon.Client) => client.setHeaders({ cookie: cookies[(next += 1) % cookies.length] as string }) } : {}),
  });
  const percentile = (key: 'p50' | 'p97_5' | 'p99') => result.latency[key];
  return {
    label,
    rps: result.requests.average,
    p50: percentile('p50'),
    // autocannon reports 97.5 % and 99 %; p95 is read between them from the histogram's nearest, conservatively 97.5 %.
    p95: percentile('p97_5'),
    p99: percentile('p99'),
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
  };
}

const figures: Figures[] = [];
figures.push(await measure('bare Express route (the floor)', `http://127.0.0.1:${floorPort}`, ['/bare'], false));
figures.push(await measure('GET /tests (the organisation’s tests list)', base, [`/api/orgs/${admin.orgId}/tests`], true));
figures.push(await measure('GET /tests/:id (a test’s detail)', base, testIds.map((id) => `/api/orgs/${admin.orgId}/tests/${id}`), true));

process.stdout.write(`\n${CLIENTS} signed-in clients, ${SECONDS} s each, ${TESTS} tests in the organisation; load average ${loadavg().map((v) => v.toFixed(2)).join(' ')}\n\n`);
process.stdout.write(`${'route'.padEnd(44)} ${'req/s'.padStart(8)} ${'p50 ms'.padStart(8)} ${'p97.5 ms'.padStart(9)} ${'p99 ms'.padStart(8)} ${'errors'.padStart(7)} ${'non-2xx'.padStart(8)}\n`);
for (const f of figures) {
  process.stdout.write(`${f.label.padEnd(44)} ${f.rps.toFixed(0).padStart(8)} ${f.p50.toFixed(0).padStart(8)} ${f.p95.toFixed(0).padStart(9)} ${f.p99.toFixed(0).padStart(8)} ${String(f.errors).padStart(7)} ${String(f.non2xx).padStart(8)}\n`);
}

api.kill('SIGTERM');
floor.kill('SIGTERM');
await dataSource.destroy();
process.exit(0);
