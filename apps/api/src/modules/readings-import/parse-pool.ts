import { fileURLToPath } from 'node:url';
import Piscina from 'piscina';
import { ImportProblem } from './import-problem.js';
import type { ImportParseOutcome, ImportParseTask, ParseOutcome, ParseTask, PreviewOutcome, PreviewTask, StartedTask, ThreadAnswer } from './parse-task.js';

/**
 * Heap one parse thread may use. The largest file allowed (40 MB, 500,000 readings) takes
 * about two thirds of it (bench:parse); a damaged file that asks for more is stopped.
 */
export const PARSE_HEAP_LIMIT_MB = 384;

// Running from TypeScript sources (tsx, vitest), the thread registers tsx's loader first.
const FROM_SOURCE = import.meta.url.endsWith('.ts');
const WORKER_FILE = fileURLToPath(new URL(FROM_SOURCE ? './parse-worker-from-source.mjs' : './parse-worker.js', import.meta.url));

export const PARSE_THREADS = 4;

/** The longest a parse may wait for a thread to take it (its deadline starts then). */
const THREAD_WAIT_MS = 60_000;

let pool: Piscina<StartedTask, ThreadAnswer> | undefined;

function parsePool(): Piscina<StartedTask, ThreadAnswer> {
  pool ??= new Piscina<StartedTask, ThreadAnswer>({
    filename: WORKER_FILE,
    // One thread kept warm: previews answer without a thread start.
    minThreads: 1,
    // As many threads as imports a worker runs at once (IMPORT_CONCURRENCY, 3) and one for
    // previews, so a parse seldom waits for a thread.
    maxThreads: PARSE_THREADS,
    idleTimeout: 30_000,
    // Threads outlive no task: a stopped or crashed one is replaced by the pool.
    resourceLimits: { maxOldGenerationSizeMb: PARSE_HEAP_LIMIT_MB, maxYoungGenerationSizeMb: 32 },
    // A file is parsed once; queued parses wait rather than fail.
    maxQueue: 'auto',
  });
  return pool;
}

const unreadable = (what: string) =>
  new ImportProblem(
    `The file could not be read: ${what}. It may be damaged — open it in Excel or LibreOffice, save it again (as .xlsx or CSV) and upload that.`,
  );

/**
 * Runs a parse on a separate thread with a deadline and a heap limit, so that no file —
 * however damaged — can hang or exhaust the process that asked: a parse that has not
 * finished by the deadline is stopped, as is one that needs more memory than the limit,
 * and both answer with an ImportProblem that says what to do. The deadline counts from the
 * moment a thread starts the parse (the thread raises a shared flag), so a slow thread
 * start on a loaded machine is not charged to the file; the wait for a thread has its own
 * bound. The bytes are moved to the thread when they own their memory (not copied): do
 * not use them after the call.
 * @throws ImportProblem when the file cannot be read (its content), never for our own faults.
 */
export async function parseOffThread(task: PreviewTask, deadlineMs: number): Promise<PreviewOutcome>;
export async function parseOffThread(task: ImportParseTask, deadlineMs: number): Promise<ImportParseOutcome>;
export async function parseOffThread(task: ParseTask, deadlineMs: number): Promise<ParseOutcome>;
export async function parseOffThread(task: ParseTask, deadlineMs: number): Promise<ParseOutcome> {
  const started = new Int32Array(new SharedArrayBuffer(4));
  const stop = new AbortController();
  const waitUntil = Date.now() + THREAD_WAIT_MS;
  let finishBy: number | null = null;
  const watchdog = setInterval(() => {
    if (finishBy === null && Atomics.load(started, 0) === 1) finishBy = Date.now() + deadlineMs;
    if (Date.now() > (finishBy ?? waitUntil)) stop.abort();
  }, 50);
  let answer: ThreadAnswer;
  try {
    const { buffer, byteOffset, byteLength } = task.bytes;
    const movable = buffer instanceof ArrayBuffer && byteOffset === 0 && byteLength === buffer.byteLength;
    answer = await parsePool().run({ ...task, started }, { signal: stop.signal, ...(movable ? { transferList: [buffer] } : {}) });
  } catch (error) {
    if (isAbort(error)) {
      throw finishBy === null
        ? new Error(`no parse thread took the file within ${THREAD_WAIT_MS / 1000} s`)
        : unreadable(`reading it did not finish within ${Math.round(deadlineMs / 1000)} s`);
    }
    if ((error as { code?: string }).code === 'ERR_WORKER_OUT_OF_MEMORY') {
      throw unreadable(`reading it needed more than the ${PARSE_HEAP_LIMIT_MB} MB of memory one file may use`);
    }
    throw error;
  } finally {
    clearInterval(watchdog);
  }
  if (answer.kind === 'problem') {
    const { message, issues, issueCount, kind } = answer.problem;
    throw new ImportProblem(message, issues, issueCount, kind);
  }
  return answer;
}

function isAbort(error: unknown): boolean {
  const name = (error as { name?: string } | null)?.name;
  return name === 'AbortError' || name === 'TimeoutError';
}

/**
 * Starts the pool's first thread now (the worker at start-up), so the first import does not
 * wait for a thread to load — slow when running from TypeScript sources on a busy machine.
 */
export async function warmParsePool(): Promise<void> {
  await parseOffThread({ kind: 'preview', bytes: Buffer.from('warm,up\n1,2\n'), type: 'csv', limits: { maxFileBytes: 1024, maxRows: 10 }, delimiter: ',', previewRows: 2 }, THREAD_WAIT_MS);
}

/** Stops the parse threads (at shutdown, and between test files). */
export async function closeParsePool(): Promise<void> {
  const running = pool;
  pool = undefined;
  await running?.destroy();
}
