import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { jsonBody, sendJsonBody } from '../json-body.js';

const value = { tests: [{ id: 'a', reference: 'T-1 — ü', topDepthM: 2.5, submittedAt: null }], note: 'x'.repeat(5_000) };

function appAnswering(send: (res: express.Response) => void): express.Express {
  const app = express();
  app.get('/', (_req, res) => send(res));
  return app;
}

describe('a JSON answer encoded once and kept', () => {
  it('when it is sent, then body, type and ETag are exactly what res.json gives for the same value', async () => {
    const fromJson = await request(appAnswering((res) => res.json(value))).get('/').expect(200);
    const kept = await request(appAnswering((res) => sendJsonBody(res, jsonBody(value)))).get('/').expect(200);
    expect(kept.headers['etag']).toBe(fromJson.headers['etag']);
    expect(kept.headers['content-type']).toBe(fromJson.headers['content-type']);
    expect(kept.body).toEqual(value);
  });

  it('when the browser already holds it (If-None-Match), then 304 without a body', async () => {
    const app = appAnswering((res) => sendJsonBody(res, jsonBody(value)));
    const first = await request(app).get('/').expect(200);
    const again = await request(app).get('/').set('If-None-Match', first.headers['etag'] as string).expect(304);
    expect(again.text).toBe('');
  });
});
