import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { GEO_CORE_VERSION } from './geo-core-version.js';

describe('GEO_CORE_VERSION', () => {
  it('equals the package version, as its doc comment promises', () => {
    const manifest = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version: string };
    expect(GEO_CORE_VERSION).toBe(manifest.version);
  });
});
