// A session's safety paths in the browser: a warning sign at a gate stops all playing until a clinician
// has reviewed it (and the clinician's caseload says so, urgently); and a session left mid-block by a
// reload comes back where it was, paused. Each run invites its own musician (new-musician.mjs): a red
// flag changes that musician's plan for good, and the demo musicians belong to the other scenarios.
import { TIMEOUT, signIn } from './helpers.mjs';
import { musicianWithPlan } from './new-musician.mjs';

const CLINICIAN = 'tomas.reyne@linden-clinic.example';

async function visible(locator, timeout = TIMEOUT) {
  await locator.first().waitFor({ state: 'visible', timeout });
  return locator.first();
}

async function startSession(page, baseUrl, speed) {
  await page.goto(`${baseUrl}/home?speed=${speed}`, { waitUntil: 'networkidle' });
  await visible(page.getByTestId('screen-musician-home'));
  await (await visible(page.getByTestId('session-start-0'))).click();
  await visible(page.getByTestId('gate-before'));
}

const seconds = (clock) => {
  const [m, s] = clock.trim().split(':').map(Number);
  return m * 60 + s;
};

export const safetyScenarios = [
  {
    name: 'a warning sign at a gate stops the session and all playing until review, and the clinician sees an urgent alert',
    run: async ({ page, baseUrl, size }) => {
      const name = `Wren Calder ${size}`;
      const email = `wren.calder.${size}@harbourside.example`;
      await musicianWithPlan(page.context().browser(), baseUrl, { clinician: CLINICIAN, name, email, instrument: 'Viola' });

      await signIn(page, baseUrl, email);
      await startSession(page, baseUrl, 1200);
      await page.getByTestId('gate-pain-0').click();
      await page.getByTestId('gate-flag-numbness').click();
      const answer = page.getByTestId('gate-flag-numbness');
      if ((await answer.getAttribute('aria-checked')) !== 'true') throw new Error('the numbness question is not marked yes');
      await page.getByTestId('gate-continue').click();

      const caution = await visible(page.getByTestId('red-flag-caution'));
      const words = await caution.innerText();
      for (const expected of ['Stop playing and seek prompt clinical review', 'All playing is stopped until your clinician clears it']) {
        if (!words.includes(expected)) throw new Error(`the stop screen does not say "${expected}":\n${words}`);
      }
      await visible(page.getByTestId('caution-card'));
      await visible(page.getByTestId('clinician-notified'));
      await visible(page.getByTestId('send-status').getByText(/Saved/));
      if (await page.getByTestId('timer-warm_up').count()) throw new Error('the warm-up started after a red flag');

      await page.getByTestId('session-back').click();
      await visible(page.getByTestId('day-status-stopped'));
      const starts = page.locator('[data-testid^="session-start-"]');
      for (let i = 0; i < (await starts.count()); i += 1) {
        if ((await starts.nth(i).getAttribute('aria-disabled')) !== 'true') throw new Error('a session can still be started after the red flag');
      }

      const context = await page.context().browser().newContext({ viewport: page.viewportSize() });
      const clinic = await context.newPage();
      await signIn(clinic, baseUrl, CLINICIAN);
      await visible(clinic.getByTestId('screen-caseload'));
      const entry = clinic.getByTestId('caseload-entry').filter({ hasText: name });
      const alert = await visible(entry.getByTestId('alert-red_flag'));
      const alertText = await alert.innerText();
      if (!alertText.includes('Urgent · Red flag')) throw new Error(`the caseload alert is not marked urgent: ${alertText}`);
      await context.close();
    },
  },
  {
    name: 'a reload in the middle of a block brings the session back at the same place, paused, with Start over',
    run: async ({ page, baseUrl, size }) => {
      const email = `teo.marsh.${size}@harbourside.example`;
      await musicianWithPlan(page.context().browser(), baseUrl, { clinician: CLINICIAN, name: `Teo Marsh ${size}`, email, instrument: 'Horn' });

      await signIn(page, baseUrl, email);
      // At ×10 the 1 min warm-up takes 6 s and a 5 min block 30 s.
      await startSession(page, baseUrl, 10);
      await page.getByTestId('gate-pain-0').click();
      await page.getByTestId('gate-continue').click();
      await visible(page.getByTestId('timer-play'), 20_000);
      await page.waitForTimeout(1_500);
      const before = seconds(await page.getByTestId('timer-countdown').innerText());
      if (before >= 300) throw new Error(`block 1 has not started counting down: ${before} s left`);

      await page.reload({ waitUntil: 'networkidle' });
      const notice = await (await visible(page.getByTestId('session-restored'))).innerText();
      if (!/Block 1 is paused with \d\d:\d\d to go/.test(notice)) throw new Error(`the restored session does not say where it is:\n${notice}`);
      if (!notice.includes('Your answer at the first pain check is kept')) throw new Error(`the restored session does not keep the gate answered:\n${notice}`);
      await visible(page.getByTestId('timer-play'));
      await visible(page.getByTestId('timer-resume'));
      if (await page.getByTestId('timer-pause').count()) throw new Error('the restored timer is running, not paused');
      const restored = seconds(await page.getByTestId('timer-countdown').innerText());
      if (restored > before) throw new Error(`the block went back in time: ${before} s left before the reload, ${restored} s after`);
      await page.waitForTimeout(2_000);
      const still = seconds(await page.getByTestId('timer-countdown').innerText());
      if (still !== restored) throw new Error(`the restored timer ran on by itself: ${restored} s, then ${still} s`);

      await page.getByTestId('timer-resume').click();
      await page.waitForTimeout(1_500);
      const running = seconds(await page.getByTestId('timer-countdown').innerText());
      if (running >= restored) throw new Error(`Resume did not start the timer: ${restored} s, then ${running} s`);
      if (await page.getByTestId('session-restored').count()) throw new Error('the "paused" notice stayed after Resume');

      await page.reload({ waitUntil: 'networkidle' });
      await visible(page.getByTestId('session-restored'));
      await page.getByTestId('session-start-over').click();
      await visible(page.getByTestId('gate-before'));
      if (await page.getByTestId('session-restored').count()) throw new Error('the notice stayed after Start over');
      await page.reload({ waitUntil: 'networkidle' });
      await visible(page.getByTestId('gate-before'));
      if (await page.getByTestId('session-restored').count()) throw new Error('Start over did not forget the kept place');
    },
  },
];
