// Makes sure Playwright has a Chromium to drive: Debian's /usr/bin/chromium when
// installed, otherwise Playwright's own build, downloaded once (needs internet).
import { existsSync } from 'node:fs';
import { execFileSync } from 'node:child_process';
import { chromium } from '@playwright/test';

if (existsSync('/usr/bin/chromium')) process.exit(0);
if (existsSync(chromium.executablePath())) process.exit(0);
console.log('No Chromium found: fetching Playwright\'s Chromium (one time) ...');
execFileSync('npx', ['playwright', 'install', 'chromium'], { stdio: 'inherit' });
