#!/usr/bin/env node
/**
 * `npm run test:e2e`: make sure a Chromium exists, make sure the app is built, then run
 * `npx playwright test` with any extra arguments passed through.
 * Browser order: $CHROMIUM_PATH, /usr/bin/chromium, /usr/bin/chromium-browser, Playwright's own.
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { chromium } from '@playwright/test';

const say = (text) => console.log(`[e2e] ${text}`);

function run(command, args, env = process.env) {
  const result = spawnSync(command, args, { stdio: 'inherit', env });
  return result.status ?? 1;
}

function playwrightBrowser() {
  try {
    const path = chromium.executablePath();
    return path && existsSync(path) ? path : undefined;
  } catch {
    return undefined;
  }
}

function findBrowser() {
  const fromEnv = process.env.CHROMIUM_PATH;
  if (fromEnv) {
    if (existsSync(fromEnv)) return fromEnv;
    say(`CHROMIUM_PATH is set to ${fromEnv}, but no file is there; looking elsewhere.`);
  }
  for (const path of ['/usr/bin/chromium', '/usr/bin/chromium-browser']) {
    if (existsSync(path)) return path;
  }
  return playwrightBrowser();
}

function hasCommand(name) {
  return spawnSync('sh', ['-c', `command -v ${name}`], { stdio: 'ignore' }).status === 0;
}

function installBrowser() {
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (isRoot && hasCommand('apt-get')) {
    say(
      "No Chromium found. Installing Debian's chromium: apt-get update && apt-get install -y chromium",
    );
    run('apt-get', ['update']);
    run('apt-get', ['install', '-y', 'chromium']);
    return;
  }
  if (!isRoot) {
    say('No Chromium found. Trying `npx playwright install chromium` (downloads a browser).');
    run('npx', ['playwright', 'install', 'chromium']);
  }
}

let browser = findBrowser();
if (!browser) {
  installBrowser();
  browser = findBrowser();
}
if (!browser) {
  console.error(
    '[e2e] No Chromium available, so the browser tests cannot run.\n' +
      '      Get one of these and run again:\n' +
      '        - Debian/Ubuntu: sudo apt-get install chromium\n' +
      '        - any system:    npx playwright install chromium\n' +
      '        - or point CHROMIUM_PATH at an existing Chromium or Chrome binary.',
  );
  process.exit(1);
}
say(`Browser: ${browser}`);

if (!existsSync('dist/index.html')) {
  say('No build in dist/ yet: running `npm run build` first.');
  const status = run('npm', ['run', 'build']);
  if (status !== 0) process.exit(status);
}

// Hand the chosen binary to playwright.config.ts (Playwright's own browser needs no path).
const env = { ...process.env };
if (browser !== playwrightBrowser()) env.CHROMIUM_PATH = browser;
process.exit(run('npx', ['playwright', 'test', ...process.argv.slice(2)], env));
