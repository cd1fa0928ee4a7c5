import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['src/**/*.test.ts'],
    // One database for the whole suite: files run one after another, so counts and the
    // rate limiter of one file never see another file's requests.
    fileParallelism: false,
    globalSetup: ['src/testing/global-setup.ts'],
    setupFiles: ['src/testing/setup-data-source.ts'],
    testTimeout: 20_000,
    hookTimeout: 60_000,
    env: {
      NODE_ENV: 'test',
      // The minimum the app allows: keeps the suite fast, still a real bcrypt cost.
      BCRYPT_COST: '10',
      SIGN_IN_RATE_LIMIT: '5',
      SIGN_IN_CLIENT_RATE_LIMIT: '8',
      RESET_RATE_LIMIT: '3',
      // Test browsers say which client they are in X-Forwarded-For (testing/browser.ts), as a proxy would.
      TRUST_PROXY: 'loopback',
      // Damaged-file tests wait for the parse deadline: shorter than production's 20 s, long
      // enough for another organisation's import to be seen finishing first on a busy machine.
      IMPORT_PARSE_SECONDS: '12',
    },
  },
});
