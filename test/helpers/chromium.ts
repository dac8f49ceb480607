import { type Browser, chromium } from 'playwright-core';

/**
 * Debian's Chromium (installed by .ci/run with apt-get; npm's own browser downloads do not work
 * here), headless, without sandbox (tests run as root) and without the background network
 * traffic that a closed network refuses.
 */
export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
}
