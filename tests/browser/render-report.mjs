#!/usr/bin/env node
/**
 * Opens a run's report.html in headless Chromium (Debian's `chromium` package, driven by
 * playwright-core) and fails when the page logs an error, throws, or asks for any resource
 * (the report must be self-contained). Writes a full-page screenshot beside the report.
 *
 * Not part of `npm test` (it needs Chromium): run `npm run test:browser [RUN_DIR]`. Without a
 * run directory it makes one with a short hunt of scores/demo conjecture.
 * Install Chromium first: `apt-get install chromium`.
 */
import { chromium } from 'playwright-core';
import { existsSync, mkdtempSync } from 'node:fs';
import { execFileSync } from 'node:child_process';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL, fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../..', import.meta.url));
const bin = join(root, 'bin', 'refute');
const executablePath = process.env.CHROMIUM ?? '/usr/bin/chromium';
if (!existsSync(executablePath)) {
  console.error(
    `render-report: no Chromium at ${executablePath}; install Debian's chromium package or set CHROMIUM`,
  );
  process.exit(2);
}

let dir = process.argv[2];
if (dir === undefined) {
  dir = join(mkdtempSync(join(tmpdir(), 'refute-report-')), 'run');
  const demo = process.env.REFUTE_DEMO ?? join(root, 'scores', 'demo.ts');
  const r = (() => {
    try {
      execFileSync(
        process.execPath,
        [bin, 'hunt', demo, '--iterations', '4', '--batch', '200', '--out', dir],
        { stdio: 'inherit' },
      );
      return 0;
    } catch (e) {
      return e.status;
    }
  })();
  if (r !== 0 && r !== 1) process.exit(2);
}
dir = resolve(dir);
execFileSync(process.execPath, [bin, 'report', dir], { stdio: 'inherit' });
const page_url = pathToFileURL(join(dir, 'report.html')).href;

const browser = await chromium.launch({
  executablePath,
  headless: true,
  args: [
    '--no-sandbox',
    '--disable-gpu',
    '--disable-quic',
    '--no-first-run',
    '--disable-background-networking',
    '--disable-component-update',
    '--disable-sync',
  ],
});
const problems = [];
try {
  const page = await browser.newPage({ viewport: { width: 1200, height: 900 } });
  page.on('console', (m) => {
    if (m.type() === 'error' || m.type() === 'warning') problems.push(`console ${m.type()}: ${m.text()}`);
  });
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  page.on('request', (r) => {
    if (r.url() !== page_url) problems.push(`external request: ${r.url()}`);
  });
  await page.goto(page_url, { waitUntil: 'load' });
  const svgs = await page.locator('svg').count();
  const title = await page.title();
  await page.screenshot({ path: join(dir, 'report.png'), fullPage: true });
  console.log(`render-report: '${title}', ${svgs} SVG pictures, screenshot ${join(dir, 'report.png')}`);
  if (svgs < 2) problems.push(`expected the plot and at least one drawing, found ${svgs} SVG elements`);
} finally {
  await browser.close();
}
if (problems.length > 0) {
  for (const p of problems) console.error(`render-report: ${p}`);
  process.exit(1);
}
