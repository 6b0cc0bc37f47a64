// Loads the test environment (database names, ports) written by scripts/test.sh.
process.env.NODE_ENV ??= 'test';
