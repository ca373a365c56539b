// Debian's Chromium driven by playwright-core: never a
// downloaded browser. The app under test is the real build in dist/ on an ephemeral port.
import { chromium, type Browser, type BrowserContextOptions } from 'playwright-core';
import { existsSync } from 'node:fs';
import type { Server } from 'node:http';
import type { Express } from 'express';

export const CHROMIUM = '/usr/lib/chromium/chromium';

export async function launchChromium(): Promise<Browser> {
  if (!existsSync(CHROMIUM)) {
    throw new Error(`Chromium is not installed at ${CHROMIUM}; install it with: apt-get install -y --no-install-recommends chromium`);
  }
  return chromium.launch({
    executablePath: CHROMIUM,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage'],
  });
}

export async function listen(app: Express): Promise<{ url: string; server: Server }> {
  return new Promise((resolve) => {
    const server = app.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      resolve({ url: `http://127.0.0.1:${port}`, server });
    });
  });
}

/** The real build served by the app on the shared test database, with Chromium, for one test file. */
export async function startBrowserApp(options: { withJobs?: boolean; env?: Record<string, string> } = {}) {
  const { inject } = await import('vitest');
  const { randomUUID } = await import('node:crypto');
  const { mkdtempSync, rmSync } = await import('node:fs');
  const os = await import('node:os');
  const path = await import('node:path');
  const { createSequelize } = await import('../../server/db/sequelize');
  const { createApp } = await import('../../server/app');
  const { loadConfig } = await import('../../server/config');
  const { initModels } = await import('../../server/models');
  const { JobQueue } = await import('../../server/services/jobs/job-queue');
  const { LocalFileStorage } = await import('../../server/services/storage/file-storage');
  const { terrainJobHandler } = await import('../../server/services/farm-terrain.service');

  const dist = path.resolve('dist');
  if (!existsSync(path.join(dist, 'index.html'))) throw new Error('dist/ is missing: run `npx vite build` (npm test does it first)');
  const sequelize = createSequelize(inject('databaseUrl'));
  initModels(sequelize);
  const tmp = mkdtempSync(path.join(os.tmpdir(), 'fieldshed-e2e-'));
  const storage = new LocalFileStorage(path.join(tmp, 'uploads'));
  // Each file works its own queue: its files live in its own storage folder.
  const jobs = options.withJobs
    ? await JobQueue.start(inject('databaseUrl'), { terrain: terrainJobHandler({ sequelize, storage }) }, `t${randomUUID().slice(0, 8)}-`)
    : undefined;
  // `env` adds settings, e.g. basemaps and a geocoder on local fakes.
  const config = loadConfig({ NODE_ENV: 'test', SESSION_SECRET: `e2e-${randomUUID()}`, ...options.env });
  const { url, server } = await listen(createApp({ sequelize, config, storage, jobs, clientDir: dist }));
  const browser = await launchChromium();
  return {
    sequelize,
    baseUrl: url,
    browser,
    tmp,
    close: async () => {
      await browser.close();
      server.close();
      await jobs?.stop();
      await sequelize.close();
      rmSync(tmp, { recursive: true, force: true });
    },
  };
}

/**
 * A page signed in through the sign-in screen (desktop size unless `context` says otherwise). `errors` collects script errors and 5xx answers;
 * 4xx answers are part of the API (401 signed out, 404 "not set yet") and Chromium logs each as
 * a console error, so those are left out.
 */
export async function signInPage(browser: Browser, baseUrl: string, email: string, password: string, context: BrowserContextOptions = {}) {
  // Without the service worker unless a test asks for it: the other tests read the server's own answers
  // (and page.route sees every request, which it does not for requests a service worker answers).
  const page = await browser.newPage({ viewport: { width: 1280, height: 900 }, serviceWorkers: 'block', ...context });
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  page.on('console', (m) => m.type() === 'error' && !/status of 4\d\d/.test(m.text()) && errors.push(m.text()));
  page.on('response', (r) => r.status() >= 500 && errors.push(`${r.status()} ${r.url()}`));
  await page.goto(`${baseUrl}/`);
  await page.getByTestId('email').fill(email);
  await page.getByTestId('password').fill(password);
  await page.getByTestId('sign-in').click();
  await page.getByTestId('farm-row').first().waitFor();
  return { page, errors };
}
