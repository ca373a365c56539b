import { defineConfig } from 'vitest/config';

// One runner for every layer: tests/unit (pure engine), tests/api (supertest on a throwaway
// PostgreSQL cluster started by tests/setup/global-db.ts) and tests/e2e (Debian's Chromium).
export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts', 'shared/**/*.test.ts', 'server/**/*.test.ts'],
    globalSetup: ['tests/setup/global-db.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
    pool: 'forks',
    maxWorkers: 2,
  },
});
