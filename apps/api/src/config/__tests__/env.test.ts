import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

describe('env()', () => {
  it('when JWT_SECRET is missing and PUBLIC_URL malformed, then the process stops at boot naming both', () => {
    const environment: NodeJS.ProcessEnv = { ...process.env, PUBLIC_URL: 'not a url' };
    delete environment['JWT_SECRET'];
    const result = spawnSync(
      process.execPath,
      ['--import', 'tsx', '-e', "import('./src/config/env.ts').then((m) => { m.env(); console.log('booted'); })"],
      { cwd: new URL('../../..', import.meta.url), env: environment, encoding: 'utf8', timeout: 15_000 },
    );
    expect(result.status).toBe(1);
    expect(result.stdout).not.toContain('booted');
    expect(result.stderr).toContain('the environment is incomplete');
    expect(result.stderr).toMatch(/JWT_SECRET: set JWT_SECRET to at least 32 random characters/);
    expect(result.stderr).toMatch(/PUBLIC_URL: set PUBLIC_URL/);
  });
});
