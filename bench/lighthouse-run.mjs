// Runs Lighthouse in plain Node: under tsx, esbuild's name helper leaks into the functions Lighthouse
// sends to the page (`__name is not defined`). Usage: node lighthouse-run.mjs <url> [cookie]; prints scores.
// With LIGHTHOUSE_REPORT set, the full report goes there too: the scores alone do not say what to fix.
import fs from 'node:fs';
import * as chromeLauncher from 'chrome-launcher';
import lighthouse from 'lighthouse';

const [url, cookie] = process.argv.slice(2);
const chrome = await chromeLauncher.launch({
  chromePath: process.env.CHROME_PATH ?? '/usr/bin/chromium',
  chromeFlags: ['--headless=new', '--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage'],
});
try {
  const result = await lighthouse(url, {
    port: chrome.port,
    output: 'json',
    logLevel: 'error',
    onlyCategories: ['performance', 'accessibility'],
    ...(cookie ? { extraHeaders: { Cookie: cookie } } : {}),
  });
  const lhr = result?.lhr;
  if (process.env.LIGHTHOUSE_REPORT && lhr) fs.writeFileSync(process.env.LIGHTHOUSE_REPORT, JSON.stringify(lhr, null, 1));
  const failing = Object.values(lhr?.audits ?? {})
    .filter((audit) => audit.score !== null && audit.score < 0.9 && audit.scoreDisplayMode !== 'informative' && audit.scoreDisplayMode !== 'notApplicable')
    .map((audit) => audit.id);
  console.log(JSON.stringify({
    // Set when Lighthouse could not measure the page (it asks to be run again): the scores are then empty.
    runtimeError: lhr?.runtimeError?.code,
    performance: Math.round((lhr?.categories.performance?.score ?? 0) * 100),
    accessibility: Math.round((lhr?.categories.accessibility?.score ?? 0) * 100),
    finalUrl: lhr?.finalDisplayedUrl,
    failing,
    lcpMs: Math.round(lhr?.audits['largest-contentful-paint']?.numericValue ?? 0),
    tbtMs: Math.round(lhr?.audits['total-blocking-time']?.numericValue ?? 0),
  }));
} finally {
  await chrome.kill();
}
