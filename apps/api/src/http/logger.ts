import { pino } from 'pino';
import { env } from '../config/env.js';

const config = env();

/** One logger for the process; silent under tests unless LOG_LEVEL says otherwise. */
export const logger = pino({
  level: config.LOG_LEVEL ?? (config.NODE_ENV === 'test' ? 'silent' : 'info'),
  redact: ['req.headers.cookie', 'req.headers["x-csrf-token"]', 'res.headers["set-cookie"]'],
});
