/**
 * Unit and property tests. Node is the default environment because the core must run in plain
 * Node with no DOM; a UI test opts into jsdom with a `// @vitest-environment jsdom` comment.
 * Browser tests live in e2e/ and run under Playwright, not here.
 */
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    environment: 'node',
    include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
    exclude: ['node_modules/**', 'dist/**', 'e2e/**'],
  },
});
