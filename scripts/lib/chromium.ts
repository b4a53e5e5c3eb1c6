// How the project drives Debian's chromium (browser tests, bench:pages, bench:plot): headless, no sandbox (root in a
// container), no GPU, and none of the background traffic a fresh profile would start.
export const CHROMIUM_PATH = '/usr/bin/chromium';

export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-dev-shm-usage',
];
