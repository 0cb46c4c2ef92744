/**
 * Browser tests (e2e/) against the built app served by `vite preview`.
 * Uses Debian's Chromium when present (CHROMIUM_PATH, else /usr/bin/chromium); otherwise
 * Playwright's own installed browser. `npm run test:e2e` checks a browser exists first.
 */
import { existsSync } from 'node:fs';
import { defineConfig, devices } from '@playwright/test';

// E2E_PORT lets several checkouts run their browser tests side by side.
const PORT = Number(process.env.E2E_PORT ?? 4317);
const isCi = Boolean(process.env.CI);

function systemChromium(): string | undefined {
  const fromEnv = process.env.CHROMIUM_PATH;
  if (fromEnv) return fromEnv;
  return existsSync('/usr/bin/chromium') ? '/usr/bin/chromium' : undefined;
}

const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
const executablePath = systemChromium();

export default defineConfig({
  testDir: 'e2e',
  fullyParallel: false,
  forbidOnly: isCi,
  retries: 0,
  workers: isCi ? 1 : 2,
  reporter: isCi ? [['list']] : [['list'], ['html', { open: 'never' }]],
  timeout: 30_000,
  expect: { timeout: 10_000 },
  use: {
    baseURL: `http://localhost:${PORT}`,
    trace: 'retain-on-failure',
    screenshot: 'only-on-failure',
  },
  projects: [
    {
      name: 'chromium',
      use: {
        ...devices['Desktop Chrome'],
        launchOptions: {
          ...(executablePath ? { executablePath } : {}),
          args: [
            ...(isRoot ? ['--no-sandbox'] : []),
            '--disable-gpu',
            '--disable-background-networking',
            '--disable-component-update',
            '--disable-dev-shm-usage',
          ],
        },
      },
    },
  ],
  webServer: {
    command: `npx vite preview --host localhost --port ${PORT} --strictPort --bypass-lock`,
    url: `http://localhost:${PORT}`,
    reuseExistingServer: !isCi,
    timeout: 60_000,
    stdout: 'ignore',
    stderr: 'pipe',
  },
});
