import { existsSync } from 'node:fs';
import { chromium, type Browser } from 'playwright-core';

/** Where Debian's `chromium` package puts the browser; `CHARTWRIGHT_CHROMIUM` names another. */
export const CHROMIUM_PATH = process.env.CHARTWRIGHT_CHROMIUM ?? '/usr/bin/chromium';

// Without the networking flags this machine's closed network refuses Chromium's background
// connections at every start; --no-sandbox because CI runs as root; sRGB so that colours are
// compared as written. The profile is fresh and empty: playwright's launch() makes a new
// --user-data-dir for every browser and removes it on close.
const FLAGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--force-color-profile=srgb'];

/** Launches the system Chromium with a fresh, empty profile, or says why it cannot. */
export async function launchChromium(): Promise<{ browser: Browser } | { reason: string }> {
  if (!existsSync(CHROMIUM_PATH)) return { reason: `no Chromium at ${CHROMIUM_PATH} (install it with \`apt-get install -y chromium\`, as .ci/run does)` };
  try {
    return { browser: await chromium.launch({ executablePath: CHROMIUM_PATH, headless: true, args: FLAGS, timeout: 30_000 }) };
  } catch (e) {
    return { reason: `Chromium at ${CHROMIUM_PATH} did not start: ${(e as Error).message.split('\n')[0]}` };
  }
}
