/**
 * Load benchmark: many signed-in clients at once against the portal as it runs in
 * production (compiled JavaScript, started with node), on loopback.
 *
 *   source .run/services.env && pnpm --filter @porestack/api run build && pnpm --filter @porestack/api bench:load
 *
 * Seeds an organisation with BENCH_TESTS analysed tests (default 40) and BENCH_CLIENTS
 * members (default 100), signs each in with its own session, starts the compiled API
 * (API_PROCESSES processes, 1 unless set) and measures with autocannon, each
 * connection carrying its own session cookie: the tests list, a test's detail, and for the
 * floor a bare Express route in a process of its own. Prints requests/s, latency
 * percentiles, errors and the machine's load average.
 */
import './bench-env.js';
import 'reflect-metadata';
import { spawn, type ChildProcess } from 'node:child_process';
import type { EventEmitter } from 'node:events';
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
import { sendFile } from '../src/testing/import-harness.js';
import { analysedTest, draftTest } from '../src/testing/lab-fixtures.js';
import { demoReadings, demoReadingsCsv } from '../src/modules/readings-import/demo-readings.js';
import { ensureBucket } from '../src/storage/storage.js';

const CLIENTS = Number(process.env['BENCH_CLIENTS'] ?? 100);
const TESTS = Number(process.env['BENCH_TESTS'] ?? 40);
const SECONDS = Number(process.env['BENCH_SECONDS'] ?? 15);
const API_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

await dataSource.initialize();
await dataSource.runMigrations({ transaction: 'each' });
// A fresh machine's S3 fake has no bucket until the worker or a test suite makes it.
await ensureBucket();
// Counts of an earlier run (its failed sign-ins from this machine) would limit this one's sign-ins.
await dataSource.query('DELETE FROM rate_limits');

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
const api = await start(
  // BENCH_NODE_ARGS, e.g. "--cpu-prof --cpu-prof-dir=/tmp/prof": node options for the API (a profile of the run).
  [...(process.env['BENCH_NODE_ARGS']?.split(' ').filter(Boolean) ?? []), 'dist/src/server.js'],
  { NODE_ENV: 'production', PORT: String(port), LOG_LEVEL: process.env['BENCH_LOG_LEVEL'] ?? 'info', API_PROCESSES: process.env['API_PROCESSES'] ?? '1', SIGN_IN_CLIENT_RATE_LIMIT: '100000', RESET_RATE_LIMIT: '100000', RESET_CLIENT_RATE_LIMIT: '100000' },
  port,
);
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
  p97_5: number;
  p99: number;
  errors: number;
  non2xx: number;
}

async function measure(label: string, url: string, paths: string[], withSessions: boolean): Promise<Figures> {
  let next = 0;
  // Called without a callback, autocannon answers its run: an event emitter that is also a promise of the result.
  const instance = autocannon({
    url,
    connections: CLIENTS,
    duration: SECONDS,
    requests: [{ method: 'GET', setupRequest: (request) => ({ ...request, path: paths[(next += 1) % paths.length] as string }) }],
    ...(withSessions ? { setupClient: (client: autocannon.Client) => client.setHeaders({ cookie: cookies[(next += 1) % cookies.length] as string }) } : {}),
  }) as Promise<autocannon.Result> & EventEmitter;
  // Every answer's time (autocannon's own summary has no 95th percentile): percentiles read from all of them.
  const times: number[] = [];
  instance.on('response', (_client: unknown, _status: number, _bytes: number, ms: number) => times.push(ms));
  const result = await instance;
  times.sort((a, b) => a - b);
  const percentile = (q: number) => times[Math.min(times.length - 1, Math.ceil(q * times.length) - 1)] ?? Number.NaN;
  return {
    label,
    rps: result.requests.average,
    p50: percentile(0.5),
    p95: percentile(0.95),
    p97_5: percentile(0.975),
    p99: percentile(0.99),
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
  };
}

// BENCH_ROUTES, e.g. "list": only these of floor, list and detail (a profile of one route).
const routes = new Set((process.env['BENCH_ROUTES'] ?? 'floor,list,detail').split(','));
const figures: Figures[] = [];
if (routes.has('floor')) figures.push(await measure('bare Express route (the floor)', `http://127.0.0.1:${floorPort}`, ['/bare'], false));
if (routes.has('list')) figures.push(await measure('GET /tests (the organisation’s tests list)', base, [`/api/orgs/${admin.orgId}/tests`], true));
if (routes.has('detail')) figures.push(await measure('GET /tests/:id (a test’s detail)', base, testIds.map((id) => `/api/orgs/${admin.orgId}/tests/${id}`), true));

// BENCH_LOAD_ONLY=1 measures the routes under load only (quicker, while tuning them).
if (process.env['BENCH_LOAD_ONLY'] !== '1') {
  // ── Latency of /api/health alone and while heavy work runs beside it ──────────────────────
  /** p50/p95/max of `samples` sequential /api/health calls, 20 ms apart. */
  async function healthLatency(samples = 60): Promise<{ p50: number; p95: number; max: number }> {
    const times: number[] = [];
    for (let i = 0; i < samples; i += 1) {
      const started = performance.now();
      await fetch(`${base}/api/health`);
      times.push(performance.now() - started);
      await new Promise((resolve) => setTimeout(resolve, 20));
    }
    times.sort((a, b) => a - b);
    const at = (q: number) => times[Math.min(times.length - 1, Math.floor(q * times.length))] as number;
    return { p50: at(0.5), p95: at(0.95), max: times[times.length - 1] as number };
  }

  /** Runs `work` in a loop on `lanes` lanes while /api/health is timed; the work's count is returned too. */
  async function healthDuring(lanes: number, work: () => Promise<unknown>): Promise<{ p50: number; p95: number; max: number; done: number }> {
    let running = true;
    let done = 0;
    const loops = Array.from({ length: lanes }, async () => {
      while (running) {
        await work();
        done += 1;
      }
    });
    await new Promise((resolve) => setTimeout(resolve, 300));
    const figures = await healthLatency();
    running = false;
    await Promise.all(loops);
    return { ...figures, done };
  }

  const technicianBrowser = await openBrowser(base);
  await technicianBrowser.post('/api/auth/sign-in', { email: technician.email, password: 'correct-horse-battery' }).expect(200);
  // A 30 MB canonical CSV (the probe's size): the demo readings repeated with growing increments.
  const rowsCsv = demoReadingsCsv(demoReadings()).split('\n');
  const header = rowsCsv[0] as string;
  const body = rowsCsv.slice(1).filter((line) => line.length > 0);
  const lines: string[] = [header];
  let size = header.length;
  for (let copy = 0; size < 30 * 1024 * 1024; copy += 1) {
    for (const line of body) {
      const [increment, ...rest] = line.split(',');
      const text = `${Number(increment) + copy * 100},${rest.join(',')}`;
      lines.push(text);
      size += text.length + 1;
    }
  }
  const bigCsv = Buffer.from(lines.join('\n'));
  const draft = await draftTest(admin.orgId, technician.userId);
  const uploaded = await sendFile(technicianBrowser, admin.orgId, draft.testId, bigCsv, 'bench-30mb.csv').expect(201);
  const bigUploadId = (uploaded.body as { upload: { id: string } }).upload.id;

  const quiet = await healthLatency();
  const duringPreviews = await healthDuring(2, () => technicianBrowser.get(`/api/orgs/${admin.orgId}/uploads/${bigUploadId}/preview`));
  const failing = await openBrowser(base);
  const duringSignIns = await healthDuring(8, () => failing.post('/api/auth/sign-in', { email: `nobody-${Math.random()}@bench.porestack.test`, password: 'not-the-password' }).expect(401));

  // Password reset requests: the answer and its time must not tell a known address from an unknown one.
  async function resetTimes(emails: () => string, count: number): Promise<number[]> {
    const browser = await openBrowser(base);
    const times: number[] = [];
    for (let i = 0; i < count; i += 1) {
      const started = performance.now();
      await browser.post('/api/auth/password-reset/request', { email: emails() }).expect(202);
      times.push(performance.now() - started);
    }
    return times.sort((a, b) => a - b);
  }
  const median = (values: number[]) => values[Math.floor(values.length / 2)] as number;
  const knownResets = await resetTimes(() => (people[Math.floor(Math.random() * people.length)] as { email: string }).email, 40);
  const unknownResets = await resetTimes(() => `nobody-${Math.random()}@bench.porestack.test`, 40);

  process.stdout.write(`\n/api/health (60 calls, 20 ms apart)            p50 ms  p95 ms  max ms\n`);
  for (const [label, f] of [
    ['quiet', quiet],
    [`during 30 MB CSV previews (2 at a time, ${duringPreviews.done} done)`, duringPreviews],
    [`during failed sign-ins (8 at a time, ${duringSignIns.done} done)`, duringSignIns],
  ] as const) {
    process.stdout.write(`${label.padEnd(46)} ${f.p50.toFixed(1).padStart(7)} ${f.p95.toFixed(1).padStart(7)} ${f.max.toFixed(1).padStart(7)}\n`);
  }
  process.stdout.write(`\npassword reset request, median of 40: known address ${median(knownResets).toFixed(1)} ms, unknown ${median(unknownResets).toFixed(1)} ms\n`);
}

process.stdout.write(`\n${CLIENTS} signed-in clients, ${SECONDS} s each, ${TESTS} tests in the organisation; load average ${loadavg().map((v) => v.toFixed(2)).join(' ')}\n\n`);
process.stdout.write(`${'route'.padEnd(44)} ${'req/s'.padStart(8)} ${'p50 ms'.padStart(8)} ${'p95 ms'.padStart(8)} ${'p97.5 ms'.padStart(9)} ${'p99 ms'.padStart(8)} ${'errors'.padStart(7)} ${'non-2xx'.padStart(8)}\n`);
for (const f of figures) {
  process.stdout.write(`${f.label.padEnd(44)} ${f.rps.toFixed(0).padStart(8)} ${f.p50.toFixed(0).padStart(8)} ${f.p95.toFixed(0).padStart(8)} ${f.p97_5.toFixed(0).padStart(9)} ${f.p99.toFixed(0).padStart(8)} ${String(f.errors).padStart(7)} ${String(f.non2xx).padStart(8)}\n`);
}

api.kill('SIGTERM');
floor.kill('SIGTERM');
await dataSource.destroy();
process.exit(0);
