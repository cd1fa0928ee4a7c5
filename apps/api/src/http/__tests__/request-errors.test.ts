import type { NextFunction, Request, Response } from 'express';
import request from 'supertest';
import { describe, expect, it, vi } from 'vitest';
import { createApp } from '../../app.js';
import { dataSource } from '../../data-source.js';
import { OrganisationEntity } from '../../modules/organisations/organisation.entity.js';
import { UserEntity } from '../../modules/users/user.entity.js';
import { openBrowser, signUpAdmin, TEST_PASSWORD, uniqueEmail } from '../../testing/browser.js';
import { errorMiddleware } from '../error-middleware.js';
import { logger } from '../logger.js';

const app = createApp();

async function counts() {
  return {
    users: await dataSource.getRepository(UserEntity).count(),
    organisations: await dataSource.getRepository(OrganisationEntity).count(),
  };
}

describe('malformed requests', () => {
  it('when the body is not valid JSON, then 400 invalid_json with a message and nothing is written', async () => {
    const before = await counts();
    const browser = await openBrowser(app);
    const res = await browser.post('/api/auth/sign-up', '{"name": "Half', ).expect(400);
    expect(res.body).toEqual({ code: 'invalid_json', message: expect.stringMatching(/not valid JSON/) });
    expect(await counts()).toEqual(before);
  });

  it('when sign-up fields are wrong, then 400 validation_failed names each field and nothing is written', async () => {
    const before = await counts();
    const browser = await openBrowser(app);
    const res = await browser
      .post('/api/auth/sign-up', { name: '', email: 'not-an-email', password: 'short', organisationName: 'Org' })
      .expect(400);
    expect(res.body.code).toBe('validation_failed');
    expect(res.body.message).toMatch(/3 fields need attention: name, email, password/);
    expect(res.body.issues).toEqual([
      { path: 'name', message: 'Enter your name.' },
      { path: 'email', message: 'Enter a valid e-mail address, like name@example.org.' },
      { path: 'password', message: 'Use a password of at least 10 characters.' },
    ]);
    expect(await counts()).toEqual(before);
  });

  it('when an admin invites with an unknown role, then 400 names the roles field and no invitation is stored', async () => {
    const { browser, orgId } = await signUpAdmin(app, 'badrole');
    const res = await browser.post(`/api/orgs/${orgId}/invitations`, { email: uniqueEmail('x'), roles: ['technician', 'owner'] }).expect(400);
    expect(res.body.issues).toEqual([{ path: 'roles.1', message: 'Choose one of the listed roles: admin, technician, lab_manager, designer, client.' }]);
    const pending = await browser.get(`/api/orgs/${orgId}/invitations`).expect(200);
    expect(pending.body).toEqual([]);
  });

  it('when the body is over 1 MB, then 413 payload_too_large', async () => {
    const browser = await openBrowser(app);
    const res = await browser.post('/api/auth/sign-in', { email: 'a@b.test', password: 'x'.repeat(1_100_000) }).expect(413);
    expect(res.body.code).toBe('payload_too_large');
  });

  it('when an unknown /api path is asked for, then 404 JSON naming it', async () => {
    const res = await request(app).get('/api/no-such-thing').expect(404);
    expect(res.body).toEqual({ code: 'not_found', message: 'There is no API endpoint GET /api/no-such-thing.' });
  });

  it('when a route fails unexpectedly, then 500 with a generic message and no stack trace', () => {
    const res = { status: vi.fn().mockReturnThis(), json: vi.fn() };
    const logged = vi.spyOn(logger, 'error').mockImplementation(() => undefined);
    const req = { method: 'GET', originalUrl: '/api/orgs/x/tests' };
    errorMiddleware(new Error('secret internals'), req as unknown as Request, res as unknown as Response, vi.fn() as NextFunction);
    expect(res.status).toHaveBeenCalledWith(500);
    const body = res.json.mock.calls[0]?.[0] as { code: string; message: string };
    expect(body.code).toBe('internal');
    expect(JSON.stringify(body)).not.toMatch(/secret internals|at /);
    expect(logged).toHaveBeenCalledWith(expect.objectContaining({ method: 'GET', url: '/api/orgs/x/tests' }), 'unhandled error');
    logged.mockRestore();
  });
});

describe('CSRF protection', () => {
  it('when a sign-up is posted without the CSRF token, then 403 csrf_invalid telling the person to reload, and nothing is written', async () => {
    const before = await counts();
    const res = await request(app)
      .post('/api/auth/sign-up')
      .send({ name: 'No Token', email: uniqueEmail('csrf'), password: TEST_PASSWORD, organisationName: 'Org' })
      .expect(403);
    expect(res.body.code).toBe('csrf_invalid');
    expect(res.body.message).toMatch(/Reload the page/);
    expect(await counts()).toEqual(before);
  });

  it('when a signed-in admin deletes with a forged token, then 403 csrf_invalid', async () => {
    const { browser, orgId, session } = await signUpAdmin(app, 'forged');
    const res = await browser.agent
      .delete(`/api/orgs/${orgId}/members/${session.user.id}`)
      .set('x-csrf-token', `${browser.csrfToken.slice(0, -4)}AAAA`)
      .expect(403);
    expect(res.body.code).toBe('csrf_invalid');
  });

  it('when a token from another browser is sent, then 403 csrf_invalid', async () => {
    const first = await openBrowser(app);
    const second = await openBrowser(app);
    const res = await second.agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', first.csrfToken)
      .send({ email: 'a@b.test', password: 'x' })
      .expect(403);
    expect(res.body.code).toBe('csrf_invalid');
  });

  it('when a person signs in, then the same CSRF token keeps working for the next request', async () => {
    const { email } = await signUpAdmin(app, 'keeptoken');
    const browser = await openBrowser(app);
    await browser.post('/api/auth/sign-in', { email, password: TEST_PASSWORD }).expect(200);
    await browser.post('/api/auth/sign-out').expect(204);
  });
});
