import { mergeConfig } from 'vitest/config';
import base from './vite.config.ts';

const merged = mergeConfig(base, {
  test: { testTimeout: 60_000, hookTimeout: 120_000, fileParallelism: false },
});
// mergeConfig concatenates arrays: the end-to-end run must include only its own files.
merged.test.include = ['tests/e2e/**/*.test.ts'];
export default merged;
