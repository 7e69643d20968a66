// The clinician's screens against the seeded demo: a plan that cannot reach its event, fixed and
// activated (the musician is e-mailed), and a record built from real check-ins. These run after the
// other scenarios; each run only adds a new plan version, so the phone and wide runs both pass.
import { TIMEOUT, signIn } from './helpers.mjs';
const CLINICIAN = 'maren.oakley@linden-clinic.example';

async function openRecord(page, baseUrl, name) {
  await signIn(page, baseUrl, CLINICIAN);
  await page.getByTestId('screen-caseload').waitFor({ timeout: TIMEOUT });
  await page.getByRole('link', { name: `Open the record of ${name}` }).click();
  await page.getByTestId('screen-record').getByText(name).first().waitFor({ timeout: TIMEOUT });
}

function isoInDays(days) {
  const date = new Date(Date.now() + days * 86_400_000);
  return date.toISOString().slice(0, 10);
}

async function visible(page, testId) {
  await page.getByTestId(testId).first().waitFor({ state: 'visible', timeout: TIMEOUT });
}

export const clinicianScenarios = [
  {
    name: 'a clinician fits a plan to an event that is too close, activates it, and the musician is e-mailed',
    run: async ({ page, baseUrl }) => {
      await openRecord(page, baseUrl, 'Noor Haddad');
      await page.getByTestId('record-tab-plan').click();
      await visible(page, 'plan-versions');
      await page.getByTestId('plan-new-version').click();
      await visible(page, 'screen-plan-builder');

      // Three weeks away: far too close for her tolerance and target.
      await page.getByTestId('plan-event-date').fill(isoInDays(21));
      await visible(page, 'preview-infeasible');
      const reduced = await page.getByTestId('option-reduced-programme').innerText();
      if (!reduced.includes('Toccata on a Bell Theme')) throw new Error(`the reduced programme does not list the demanding piece:\n${reduced}`);
      await visible(page, 'reduced-not-ready');

      await page.getByTestId('option-later-date').click();
      await visible(page, 'preview-feasible');
      if (await page.getByTestId('preview-infeasible').count()) throw new Error('still out of reach after moving the event');

      await page.getByTestId('plan-activate').click();
      await visible(page, 'activate-confirm');
      await page.getByTestId('activate-confirm-yes').click();
      await visible(page, 'plan-activated');
      const banner = await page.getByTestId('plan-activated').innerText();
      const version = banner.match(/Version (\d+) is active/)?.[1];
      if (!version) throw new Error(`no version in the activation message: ${banner}`);
      if (!banner.includes('e-mailed')) throw new Error(`the activation message does not say the musician was e-mailed: ${banner}`);

      const context = await page.context().browser().newContext({ viewport: page.viewportSize() });
      const admin = await context.newPage();
      await signIn(admin, baseUrl, 'admin@ritorno.example');
      const row = admin
        .getByTestId('mail-row')
        .filter({ hasText: `Your return-to-playing plan is ready (version ${version})` })
        .filter({ hasText: 'noor.haddad@harbourside.example' });
      for (let attempt = 0; attempt < 10; attempt += 1) {
        await admin.goto(`${baseUrl}/mailbox`, { waitUntil: 'networkidle' });
        if (await row.first().isVisible()) break;
        if (attempt === 9) throw new Error(`no "plan is ready (version ${version})" e-mail to Noor in the development mailbox`);
        await admin.waitForTimeout(500);
      }
      await context.close();

      await page.getByTestId('plan-back').click();
      await visible(page, 'plan-versions');
      await page.getByTestId('version-status-active').first().waitFor({ timeout: TIMEOUT });
    },
  },
  {
    name: 'a clinician asked to confirm removing a piece can back out with Escape, and the piece stays',
    run: async ({ page, baseUrl }) => {
      await openRecord(page, baseUrl, 'Caio Brandt');
      await page.getByTestId('record-tab-repertoire').click();
      const row = page.getByTestId('piece-row').filter({ hasText: 'Pastorale in G' });
      const remove = row.locator('[data-testid^="piece-delete-"]').first();
      await remove.waitFor({ state: 'visible', timeout: TIMEOUT });
      const id = await remove.getAttribute('data-testid');
      await remove.click();
      const dialog = page.getByRole('alertdialog', { name: 'Remove ‘Pastorale in G’ from the repertoire?' });
      await dialog.waitFor({ state: 'visible', timeout: TIMEOUT });
      const focused = () => page.evaluate(() => document.activeElement?.getAttribute('data-testid'));
      if ((await focused()) !== `${id}-no`) throw new Error(`focus is not on Cancel when the confirmation opens: ${await focused()}`);
      await page.keyboard.press('Escape');
      await dialog.waitFor({ state: 'detached', timeout: TIMEOUT });
      if ((await focused()) !== id) throw new Error(`focus did not return to the Remove button: ${await focused()}`);
      await row.first().waitFor({ state: 'visible', timeout: TIMEOUT });
    },
  },
  {
    name: 'a clinician reads the check-ins, the chart and the load of a musician held after pain',
    run: async ({ page, baseUrl, size }) => {
      await openRecord(page, baseUrl, 'Caio Brandt');
      await visible(page, 'playing-chart');
      const summary = await page.getByTestId('chart-summary').innerText();
      if (!/minutes played/.test(summary) || !/Pain reported on \d+ days?/.test(summary)) throw new Error(`unexpected chart summary: ${summary}`);
      await visible(page, 'record-load');
      await visible(page, 'load-ratio');
      await visible(page, size === 'phone' ? 'check-in-list' : 'check-in-table');
      const rows = await page.getByTestId('check-in-row').count();
      if (rows < 5) throw new Error(`expected the seeded check-ins, found ${rows} rows`);
      await page.getByTestId('screen-record').getByText('over the threshold').first().waitFor({ timeout: TIMEOUT });
    },
  },
];
