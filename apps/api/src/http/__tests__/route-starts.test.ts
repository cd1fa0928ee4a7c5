import { describe, expect, it } from 'vitest';
import { routeStarts } from '../routes.js';

/** A route group is entered only for paths one of its routes could match; it must never skip one a route matches. */
describe('where a route group starts', () => {
  const tests = routeStarts(['/api/orgs/:orgId/tests', '/api/orgs/:orgId/tests/:testId', '/api/orgs/:orgId/tests/:testId/analysis']);

  it('when a path is one of the routes, with any ids, a trailing slash or other letter case, then the group is entered', () => {
    for (const path of ['/api/orgs/3f1c/tests', '/api/orgs/3f1c/tests/', '/api/orgs/3f1c/tests/9a2b', '/API/Orgs/3f1c/TESTS/9a2b/analysis']) {
      expect(tests.test(path), path).toBe(true);
    }
  });

  it('when a path only shares a beginning with the routes, then the group is passed by', () => {
    for (const path of ['/api/orgs/3f1c', '/api/orgs/3f1c/testsuite', '/api/orgs//tests', '/api/orgs/3f1c/projects', '/api/health', '/tests']) {
      expect(tests.test(path), path).toBe(false);
    }
  });

  it('when a route has a wildcard or a dotted name, then the group starts at the plain segments before it', () => {
    const files = routeStarts(['/{*splat}', '/api/orgs/:orgId/exports/summary.csv']);
    expect(files.test('/members')).toBe(true);
    expect(files.test('/')).toBe(true);
    const dotted = routeStarts(['/api/orgs/:orgId/exports/summary.csv']);
    expect(dotted.test('/api/orgs/3f1c/exports/summary.csv')).toBe(true);
    expect(dotted.test('/api/orgs/3f1c/exports/summaryxcsv')).toBe(false);
  });
});
