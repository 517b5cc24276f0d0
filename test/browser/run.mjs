#!/usr/bin/env node
// Browser tests: make sure Debian's Chromium is present (install it when we are root), then run
// the Vitest browser suite against the production build in dist/. Never skips silently.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

export const CHROMIUM = process.env.HALFWAVE_CHROMIUM ?? '/usr/bin/chromium';

function ensureChromium() {
  if (existsSync(CHROMIUM)) return;
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot) {
    console.error(`Browser tests need Chromium at ${CHROMIUM}. Install it with:\n  sudo apt-get update && sudo apt-get install -y chromium\n(or set HALFWAVE_CHROMIUM to another Chromium binary).`);
    process.exit(1);
  }
  console.log(`Chromium not found at ${CHROMIUM}: installing Debian's chromium package (apt-get) ...`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [['update'], ['install', '-y', 'chromium']]) {
    const r = spawnSync('apt-get', args, { stdio: 'inherit', env });
    if (r.status !== 0) {
      console.error(`apt-get ${args.join(' ')} failed (exit ${r.status}); install chromium by hand and re-run.`);
      process.exit(1);
    }
  }
  if (!existsSync(CHROMIUM)) {
    console.error(`apt-get finished but ${CHROMIUM} is still missing.`);
    process.exit(1);
  }
}

ensureChromium();
if (!existsSync('dist/index.html')) {
  console.error('dist/index.html is missing: run `npm run build` first (npm test does this).');
  process.exit(1);
}
const r = spawnSync('npx', ['vitest', 'run', '--config', 'vitest.browser.config.ts', ...process.argv.slice(2)], { stdio: 'inherit' });
process.exit(r.status ?? 1);
