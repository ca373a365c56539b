// Debian's Chromium driven by playwright-core (RECIPES.md "Browser tests"): never a
// downloaded browser. The app under test is the real build in dist/ on an ephemeral port.
import { chromium, type Browser } from 'playwright-core';
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
