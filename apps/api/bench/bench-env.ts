// Imported first by the benchmarks: quiet request logs and the test bcrypt cost, before any module reads the environment.
process.env['NODE_ENV'] ??= 'test';
process.env['BCRYPT_COST'] ??= '10';
process.env['LOG_LEVEL'] ??= 'warn';
