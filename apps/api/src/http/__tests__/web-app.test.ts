import { mkdtempSync, mkdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../app.js';
import { listRoutes } from '../routes.js';

function builtWebApp(): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'porestack-web-'));
  writeFileSync(path.join(dir, 'index.html'), '<!doctype html><title>Porestack shell</title>');
  mkdirSync(path.join(dir, 'assets'));
  writeFileSync(path.join(dir, 'assets', 'app.js'), 'console.log("app")');
  return dir;
}

describe('serving the built web app', () => {
  const app = createApp({ webDist: builtWebApp() });

  it('when a browser opens / or a client-side route, then it gets the app shell with a CSP', async () => {
    for (const url of ['/', '/members', '/reset-password?token=abc', '/invitations/some-token']) {
      const res = await request(app).get(url).expect(200);
      expect(res.text).toContain('Porestack shell');
      expect(res.headers['content-security-policy']).toContain("script-src 'self'");
    }
  });

  it('when a built asset is asked for, then the file itself is served', async () => {
    const res = await request(app).get('/assets/app.js').expect(200);
    expect(res.text).toContain('console.log');
  });

  it('when an unknown /api path is asked for, then JSON 404, never the shell', async () => {
    const res = await request(app).get('/api/not-here').expect(404);
    expect(res.body.code).toBe('not_found');
  });

  it('when the shell route is registered, then it too carries a public policy', () => {
    expect(listRoutes(app).find((r) => r.path === '/{*splat}')?.access).toBe('public');
  });
});
