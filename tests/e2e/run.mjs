// Browser tests: each demo role signs in at phone and wide sizes and sees its landing screen with
// the seeded data; a clinician invites a musician who joins through the e-mailed link.
import { createRequire } from 'node:module';
import path from 'node:path';
import { ensureChromium, startServer } from './harness.mjs';
import { scenarios as roleScenarios } from './scenarios.mjs';
import { musicianScenarios } from './musician.scenarios.mjs';
import { teacherScenarios } from './teacher.scenarios.mjs';
import { clinicianScenarios } from './clinician.scenarios.mjs';
import { safetyScenarios } from './safety.scenarios.mjs';
import { firstPaintScenarios } from './first-paint.scenarios.mjs';

// The clinician's run last: it activates a new plan version for a musician other scenarios read.
const scenarios = [...roleScenarios, ...firstPaintScenarios, ...teacherScenarios, ...musicianScenarios, ...safetyScenarios, ...clinicianScenarios];

const require = createRequire(path.join(process.cwd(), 'package.json'));
const { chromium } = require('playwright-core');

const VIEWPORTS = { phone: { width: 390, height: 844 }, wide: { width: 1280, height: 800 } };

const executablePath = ensureChromium();
const server = await startServer();
const browser = await chromium.launch({
  executablePath,
  args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
});

let passed = 0;
let failed = 0;
try {
  for (const scenario of scenarios) {
    for (const [size, viewport] of Object.entries(VIEWPORTS)) {
      if (scenario.sizes && !scenario.sizes.includes(size)) continue;
      const name = `${scenario.name} (${size} ${viewport.width}x${viewport.height})`;
      const context = await browser.newContext({ viewport });
      const page = await context.newPage();
      const pageErrors = [];
      page.on('pageerror', (error) => pageErrors.push(error.message));
      page.on('console', (message) => {
        if (message.type() === 'error') pageErrors.push(message.text());
      });
      try {
        await scenario.run({ page, baseUrl: server.baseUrl, size });
        if (pageErrors.length > 0) throw new Error(`the page reported errors:\n  ${pageErrors.join('\n  ')}`);
        passed += 1;
        console.log(`  ✓ ${name}`);
      } catch (error) {
        failed += 1;
        const shot = path.join('test-results', `${name.replace(/[^a-z0-9]+/gi, '-')}.png`);
        await page.screenshot({ path: shot, fullPage: true }).catch(() => undefined);
        console.log(`  ✗ ${name}\n    ${String(error?.message ?? error).split('\n').join('\n    ')}\n    screenshot: ${shot}`);
      } finally {
        await context.close();
      }
    }
  }
} finally {
  await browser.close();
  await server.stop();
}
if (failed > 0) console.log(`\nServer log:\n${server.log()}`);
console.log(`\nbrowser: ${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
