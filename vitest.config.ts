import { defineConfig } from 'vitest/config';

// Unit and property tests: every src/**/*.spec.ts runs in Node.
export default defineConfig({
  test: {
    include: ['src/**/*.spec.ts', 'scripts/**/*.spec.ts'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 60_000,
  },
});
